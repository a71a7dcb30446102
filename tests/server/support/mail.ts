import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { startMailCatcher } from '../../../src/lib/server/dev/mail-catcher';

/**
 * Start a mail catcher in this test process on a free port, point SMTP_URL at it, and give back its
 * folder of caught messages (read them with src/lib/server/dev/caught-mail.ts).
 */
export function useMailCatcher() {
	const state = { dir: '', port: 0 };
	let catcher: Awaited<ReturnType<typeof startMailCatcher>> | undefined;
	let previousUrl: string | undefined;
	beforeAll(async () => {
		state.dir = mkdtempSync(join(tmpdir(), 'spanwright-mail-'));
		catcher = await startMailCatcher({ port: 0, dir: state.dir });
		state.port = catcher.port;
		previousUrl = process.env.SMTP_URL;
		process.env.SMTP_URL = `smtp://127.0.0.1:${catcher.port}`;
	});
	afterAll(async () => {
		if (previousUrl === undefined) delete process.env.SMTP_URL;
		else process.env.SMTP_URL = previousUrl;
		await catcher?.close();
		rmSync(state.dir, { recursive: true, force: true });
	});
	return state;
}
