// `npm run db:migrate`: apply the migrations in drizzle/ to the configured database.
import { getDb, dataDir } from '../db';

getDb();
console.log(`Migrations applied (data folder ${dataDir}).`);
