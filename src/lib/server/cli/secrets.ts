import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { dataDir } from '../db';

/**
 * Development only: give AUTH_SECRET a value generated once and kept in the data folder, so that
 * sign-ins survive restarts. Production must set AUTH_SECRET itself.
 */
export function ensureAuthSecret() {
	if (process.env.AUTH_SECRET) return process.env.AUTH_SECRET;
	mkdirSync(dataDir, { recursive: true });
	const file = join(dataDir, '.auth-secret');
	if (!existsSync(file))
		writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
	process.env.AUTH_SECRET = readFileSync(file, 'utf8').trim();
	return process.env.AUTH_SECRET;
}
