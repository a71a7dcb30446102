// `npm run db:seed`: re-create the demo scenario in the configured database.
import { seedDemo } from '../demo/seed';
import { ensureAuthSecret } from './secrets';

ensureAuthSecret();
const result = await seedDemo();
console.log(
	`Demo scenario seeded: workshop ${result.workshopId}, ${result.users.length} accounts.`
);
