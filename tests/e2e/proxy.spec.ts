// Behind a proxy: adapter-node reads the client's address from ADDRESS_HEADER (the rightmost
// XFF_DEPTH entry of X-Forwarded-For), so one address's failed sign-ins refuse only that address.
// A second built server, started here with those settings, on its own port and data folder.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, request, test } from '@playwright/test';

const PORT = Number(process.env.E2E_PROXY_PORT ?? 4191);
const ORIGIN = `http://localhost:${PORT}`;
let server: ChildProcess;
let dataDir: string;

test.beforeAll(async () => {
	dataDir = mkdtempSync(join(tmpdir(), 'spanwright-proxy-'));
	server = spawn(process.execPath, ['build/index.js'], {
		cwd: process.cwd(), // the repository (npm run test:e2e runs from there)
		env: {
			...process.env,
			PORT: String(PORT),
			ORIGIN,
			ADDRESS_HEADER: 'X-Forwarded-For',
			XFF_DEPTH: '1',
			SPANWRIGHT_DATA_DIR: dataDir,
			SMTP_URL: 'smtp://127.0.0.1:9',
			AUTH_SECRET: 'e2e-proxy-secret-not-for-production-0123456789'
		},
		stdio: 'ignore'
	});
	for (let i = 0; i < 100; i++) {
		const ok = await fetch(`${ORIGIN}/api/v1/health`).then(
			(r) => r.ok,
			() => false
		);
		if (ok) return;
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error('the proxied server did not start');
});

test.afterAll(() => {
	server?.kill();
	rmSync(dataDir, { recursive: true, force: true });
});

test('failed sign-ins count per forwarded address; a forged left-hand entry changes nothing', async () => {
	const api = await request.newContext({ baseURL: ORIGIN });
	const signIn = (forwardedFor: string) =>
		api.post('/signin?/password', {
			form: { email: 'owner@shop.example', password: 'not the password', redirectTo: '/' },
			headers: { origin: ORIGIN, accept: 'text/html', 'x-forwarded-for': forwardedFor },
			maxRedirects: 0
		});
	// five failures from one client (the proxy appends the address it saw: the rightmost entry)
	for (let i = 0; i < 5; i++) expect((await signIn('203.0.113.5')).status()).toBe(400);
	expect((await signIn('203.0.113.5')).status()).toBe(429);
	// the same client forging another address on the left is still itself
	expect((await signIn('198.51.100.7, 203.0.113.5')).status()).toBe(429);
	// another client behind the same proxy is not refused
	expect((await signIn('198.51.100.7')).status()).toBe(400);
	await api.dispose();
});
