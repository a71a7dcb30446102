// `npm run db:seed`: re-create the demo scenario in the configured database.
import { closeDb, dbReady } from '../db';
import { seedDemo } from '../demo/seed';
import { ensureAuthSecret } from './secrets';

ensureAuthSecret();
await dbReady();
const result = await seedDemo();
await closeDb();
console.log(
	`Demo scenario seeded: workshop ${result.workshopId}, ${result.users.length} accounts.`
);
