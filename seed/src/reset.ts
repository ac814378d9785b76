// `npm run seed`: reset the invented demo scenario in the configured database (DATA_DIR or DATABASE_URL).
import { createDatabase, migrateDatabase } from '@gramwatt/server';
import { demoSignInLines, resetDemo } from './seed-demo';

async function main(): Promise<void> {
  const database = await createDatabase({
    dataDir: process.env.DATA_DIR ?? 'data',
    databaseUrl: process.env.DATABASE_URL,
  });
  try {
    await migrateDatabase(database.db);
    await resetDemo(database.db);
    console.log('The demo scenario was reset.');
    for (const line of demoSignInLines()) console.log(line);
  } finally {
    await database.close();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
