import { defineConfig } from 'drizzle-kit';

/** drizzle-kit reads the schema to generate migrations: `npx drizzle-kit generate --name <intent>`. */
export default defineConfig({
  dialect: 'postgresql',
  schema: './src/database/schema/index.ts',
  out: './drizzle',
  strict: true,
  verbose: true,
});
