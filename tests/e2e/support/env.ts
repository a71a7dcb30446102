import { join } from 'node:path';

export const E2E_PORT = Number(process.env.E2E_PORT ?? 4173);

/** Where the e2e server keeps its data and caught mail (shared by the server and the specs). */
export const E2E_DATA_DIR =
	process.env.E2E_DATA_DIR ?? join(process.cwd(), 'tests', '.tmp', `e2e-data-${E2E_PORT}`);
export const E2E_MAIL_DIR = join(E2E_DATA_DIR, 'mail');
