import { join } from 'node:path';

/** Where the e2e server keeps its data and caught mail (shared by the server and the specs). */
export const E2E_DATA_DIR =
	process.env.SPANWRIGHT_DATA_DIR ?? join(process.cwd(), 'tests', '.tmp', 'e2e-data');
export const E2E_MAIL_DIR = join(E2E_DATA_DIR, 'mail');
