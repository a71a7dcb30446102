// Two built app servers on one PostgreSQL database share everything a request needs: a session made
// on one is valid on the other, signing out on one ends it on both, the sign-in throttle counts
// failures made on both, a stale save through one after a save through the other is a 409, and
// killing one mid-write loses or half-writes nothing. Uses the build from `npx vite build` (it builds
// nothing itself: run it after test:e2e, or build first); skipped without one, or on SQLite.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dialect } from '../../src/lib/server/db';
import { DEMO_ACCOUNTS } from '../../src/lib/server/demo/accounts';
import { makePgDatabase } from './support/db';

const root = join(import.meta.dirname, '../..');
const built = existsSync(join(root, 'build/handler.js'));

function freePort() {
	return new Promise<number>((resolve) => {
		const s = createServer();
		s.listen(0, '127.0.0.1', () => {
			const { port } = s.address() as { port: number };
			s.close(() => resolve(port));
		});
	});
}

interface App {
	origin: string;
	child: ChildProcess;
}

async function startApp(databaseUrl: string): Promise<App> {
	const port = await freePort();
	const origin = `http://127.0.0.1:${port}`;
	const child = spawn('node', ['server.js'], {
		cwd: root,
		env: {
			...process.env,
			DATABASE_URL: databaseUrl,
			AUTH_SECRET: 'two servers, one secret, for this test only',
			ORIGIN: origin,
			PORT: String(port),
			HOST: '127.0.0.1'
		},
		stdio: ['ignore', 'pipe', 'pipe']
	});
	for (let i = 0; i < 200; i++) {
		try {
			if ((await fetch(`${origin}/api/v1/health`)).ok) return { origin, child };
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 100));
	}
	child.kill('SIGKILL');
	throw new Error(`The app server on ${origin} did not start`);
}

const ines = DEMO_ACCOUNTS[0];

/**
 * A form post as a browser without JavaScript sends it: asking for HTML, SvelteKit answers with the
 * action's own status (a redirect is 303, a refusal its 4xx); asking for anything (fetch's default)
 * it would answer 200 with the result as JSON, as it does for an enhanced form.
 */
const form = (app: App) => ({
	origin: app.origin,
	accept: 'text/html',
	'content-type': 'application/x-www-form-urlencoded'
});

/** Sign in through the form action; the session cookie, or the answer's status when refused. */
async function signIn(app: App, email: string, password: string) {
	const res = await fetch(`${app.origin}/signin?/password`, {
		method: 'POST',
		redirect: 'manual',
		headers: form(app),
		body: new URLSearchParams({ email, password, redirectTo: '/projects' })
	});
	const cookie = res.headers
		.getSetCookie()
		.map((c) => c.split(';')[0])
		.find((c) => c.includes('authjs.session-token='));
	return { status: res.status, cookie, text: await res.text() };
}

/** The first project of the signed-in person's first workshop. */
async function firstProject(app: App, cookie: string): Promise<string> {
	const me = await (await api(app, cookie, '/me')).json();
	const projects = await (
		await api(app, cookie, `/projects?workshop=${me.workshops[0].id}`)
	).json();
	return projects.items[0].id;
}

const api = (app: App, cookie: string, path: string, init: RequestInit = {}) =>
	fetch(`${app.origin}/api/v1${path}`, {
		...init,
		headers: { cookie, 'content-type': 'application/json', origin: app.origin, ...init.headers }
	});

describe.skipIf(dialect !== 'pg' || !built)('two app servers on one PostgreSQL database', () => {
	let a: App;
	let b: App;
	let drop = async () => {};
	let url = '';

	beforeAll(async () => {
		const made = await makePgDatabase(process.env.DATABASE_URL!);
		drop = made.drop;
		url = made.url;
		const seed = spawn('npx', ['tsx', 'src/lib/server/cli/seed.ts'], {
			cwd: root,
			env: { ...process.env, DATABASE_URL: url, AUTH_SECRET: 'seed' },
			stdio: 'ignore'
		});
		await new Promise((r) => seed.on('exit', r));
		[a, b] = await Promise.all([startApp(url), startApp(url)]);
	}, 120_000);

	afterAll(async () => {
		for (const app of [a, b]) app?.child.kill('SIGTERM');
		await new Promise((r) => setTimeout(r, 500));
		await drop();
	});

	it('honours a session made on one server on the other, and ends it on both when signed out on one', async () => {
		const { cookie } = await signIn(a, ines.email, ines.password);
		expect(cookie).toBeDefined();
		expect((await api(b, cookie!, '/me')).status).toBe(200);
		const out = await fetch(`${b.origin}/signout`, {
			method: 'POST',
			redirect: 'manual',
			headers: { cookie: cookie!, ...form(b) },
			body: ''
		});
		expect(out.status).toBe(303);
		expect((await api(a, cookie!, '/me')).status).toBe(401);
		expect((await api(b, cookie!, '/me')).status).toBe(401);
	});

	it('counts failed sign-ins made on both servers', async () => {
		const noor = DEMO_ACCOUNTS[2];
		for (const app of [a, b, a, b, a]) {
			const r = await signIn(app, noor.email, 'not the password');
			expect(r.cookie).toBeUndefined();
		}
		// five failures for this account from this address, on two servers: the sixth is refused on either
		const refused = await signIn(b, noor.email, noor.password);
		expect(refused.status).toBe(429);
		expect(refused.cookie).toBeUndefined();
	});

	it('refuses a stale save through one server after a save through the other (409)', async () => {
		const { cookie } = await signIn(b, DEMO_ACCOUNTS[1].email, DEMO_ACCOUNTS[1].password);
		const projectId = await firstProject(a, cookie!);
		const list = await (await api(a, cookie!, `/projects/${projectId}/analyses`)).json();
		const first = list.items[0];
		const saved = await api(a, cookie!, `/analyses/${first.id}`, {
			method: 'PATCH',
			body: JSON.stringify({ name: 'Saved on A', version: first.version })
		});
		expect(saved.status).toBe(200);
		const stale = await api(b, cookie!, `/analyses/${first.id}`, {
			method: 'PATCH',
			body: JSON.stringify({ name: 'Stale on B', version: first.version })
		});
		expect(stale.status).toBe(409);
		const now = await (await api(b, cookie!, `/analyses/${first.id}`)).json();
		expect(now.name).toBe('Saved on A');
		expect(now.version).toBe(first.version + 1);
	});

	it('loses and half-writes nothing when one server is killed mid-write', async () => {
		const { cookie } = await signIn(b, DEMO_ACCOUNTS[1].email, DEMO_ACCOUNTS[1].password);
		const projectId = await firstProject(b, cookie!);
		const list = await (await api(b, cookie!, `/projects/${projectId}/analyses`)).json();
		const target = list.items[list.items.length - 1];
		let version = (await (await api(b, cookie!, `/analyses/${target.id}`)).json()).version;
		let acknowledged = version;
		const writing = (async () => {
			for (let i = 0; i < 200; i++) {
				try {
					const res = await api(a, cookie!, `/analyses/${target.id}`, {
						method: 'PATCH',
						body: JSON.stringify({ name: `Write ${i}`, version })
					});
					if (res.status !== 200) return;
					version = (await res.json()).version;
					acknowledged = version;
				} catch {
					return; // the server is gone
				}
			}
		})();
		await new Promise((r) => setTimeout(r, 400));
		a.child.kill('SIGKILL');
		await writing;
		const now = await (await api(b, cookie!, `/analyses/${target.id}`)).json();
		// every acknowledged save is there; one in flight is either all there or not at all
		expect(now.version).toBeGreaterThanOrEqual(acknowledged);
		expect(now.version).toBeLessThanOrEqual(acknowledged + 1);
		const revisions = await (await api(b, cookie!, `/analyses/${target.id}/revisions`)).json();
		const items = revisions.items ?? revisions;
		expect(items[0].version).toBe(now.version);
		expect(items[0].name).toBe(now.name);
		// the server that was killed leaves nothing behind that the other cannot write over
		const after = await api(b, cookie!, `/analyses/${target.id}`, {
			method: 'PATCH',
			body: JSON.stringify({ name: 'After the crash', version: now.version })
		});
		expect(after.status).toBe(200);
	});
});
