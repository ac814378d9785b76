// The product's one process: open the database (embedded PGlite in DATA_DIR, or DATABASE_URL), apply the
// migrations, load the invented demo scenario when the database is empty, then serve the API and the built
// client. Used by `npm start` and by the browser tests.
import { createApp, createDatabase, migrateDatabase } from '@gramwatt/server';
import { demoSignInLines, seedDemoIfEmpty } from '@gramwatt/seed';

const startedMs = performance.now();
const database = await createDatabase({
  dataDir: process.env.DATA_DIR ?? 'data',
  databaseUrl: process.env.DATABASE_URL,
});
await migrateDatabase(database.db);
const seeded = await seedDemoIfEmpty(database.db);

const app = await createApp({ database: database.db });
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '0.0.0.0';
await app.listen(port, host);

const shownHost = host === '0.0.0.0' ? 'localhost' : host;
console.log(
  `\nGramwatt is running at http://${shownHost}:${port} (ready in ${Math.round(performance.now() - startedMs)} ms)`,
);
console.log(
  seeded ? 'The invented demo scenario was loaded into the empty database.' : 'Database already had accounts.',
);
for (const line of demoSignInLines()) console.log(line);

async function stop() {
  await app.close();
  await database.close();
  process.exit(0);
}
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
