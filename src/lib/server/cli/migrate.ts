// `npm run db:migrate`: apply the migrations to the configured database (drizzle/ to the SQLite
// file in the data folder; drizzle/pg/ to PostgreSQL when DATABASE_URL names it).
import { closeDb, dataDir, dbReady, dialect } from '../db';

await dbReady();
await closeDb();
console.log(
	dialect === 'pg'
		? 'Migrations applied (PostgreSQL, DATABASE_URL).'
		: `Migrations applied (data folder ${dataDir}).`
);
