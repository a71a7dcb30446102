// API bench: POST /api/v1/shelf on the built app (through its start script, as deployed) against a
// bare node:http JSON server (bare-server.mjs) answering the same bytes, both loaded in turn by
// autocannon at 50 connections in the same run. Every request carries its own X-Forwarded-For from
// a pool of 5,000 addresses (the app is started with ADDRESS_HEADER=x-forwarded-for), so the real
// per-address rate limit counts every request (on SQLite in the server's memory, as deployed with
// SQLite) and none is refused: many clients,
// not one client over its budget. A second row asks for the answer without its curve
// (`?curve=none`, about a third of the bytes), the bare server answering those bytes. Reports, never
// fails on a slow number.
//
//   npx vite build && npx tsx tests/bench/api/api.ts
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';

const APP_PORT = Number(process.env.BENCH_API_PORT ?? 4481);
const BARE_PORT = APP_PORT + 1;
const SECONDS = Number(process.env.BENCH_API_SECONDS ?? 8);
const ROUNDS = Number(process.env.BENCH_API_ROUNDS ?? 3);
const CONNECTIONS = 50;
const ADDRESSES = 5000;
const GOAL_RATIO = 0.6;
const GOAL_P99_MS = 25;
// the compute table's shelf (tests/server/support/compute-table.ts)
const SHELF = {
	span: '32"',
	depth: '11 1/4"',
	thickness: '3/4"',
	material: 'red-oak',
	loads: [{ kind: 'area', pressure: '40 psf' }]
};

const ROOT = process.cwd();
const work = mkdtempSync(join(tmpdir(), 'spanwright-api-bench-'));

function start(command: string, args: string[], env: Record<string, string>): ChildProcess {
	const child = spawn(command, args, {
		env: { ...process.env, ...env },
		stdio: ['ignore', 'pipe', 'pipe'],
		detached: true
	});
	const log: string[] = [];
	child.stdout?.on('data', (d) => log.push(String(d)));
	child.stderr?.on('data', (d) => log.push(String(d)));
	child.on('exit', (code) => {
		if (code)
			process.stderr.write(`${command} ${args.join(' ')} exited with ${code}:\n${log.join('')}\n`);
	});
	return child;
}

function stop(child: ChildProcess) {
	try {
		if (child.pid) process.kill(-child.pid, 'SIGKILL');
	} catch {
		// already gone
	}
}

async function waitFor(url: string, init: RequestInit = {}, timeoutMs = 60_000) {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		try {
			const res = await fetch(url, init);
			if (res.status < 500) return res;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error(`no answer from ${url}`);
}

interface Run {
	rps: number;
	p99: number;
	non2xx: number;
	errors: number;
}

async function load(port: number, path = '/api/v1/shelf'): Promise<Run> {
	let n = 0;
	const result = await autocannon({
		url: `http://127.0.0.1:${port}${path}`,
		connections: CONNECTIONS,
		duration: SECONDS,
		requests: [
			{
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify(SHELF),
				setupRequest: (req) => {
					n = (n + 1) % ADDRESSES;
					return {
						...req,
						headers: {
							...req.headers,
							'x-forwarded-for': `10.${(n >> 16) & 255}.${(n >> 8) & 255}.${n & 255}`
						}
					};
				}
			}
		]
	});
	return {
		rps: result.requests.average,
		p99: result.latency.p99,
		non2xx: result.non2xx,
		errors: result.errors + result.timeouts
	};
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
	const entry = existsSync(join(ROOT, 'server.js')) ? 'server.js' : 'build';
	if (!existsSync(join(ROOT, 'build', 'handler.js'))) {
		console.error('No build: run `npx vite build` first (tests/bench/run.sh does).');
		process.exit(1);
	}
	const app = start('node', [entry], {
		PORT: String(APP_PORT),
		HOST: '127.0.0.1',
		ORIGIN: `http://127.0.0.1:${APP_PORT}`,
		AUTH_SECRET: 'bench-only-secret-not-for-production-0123456789',
		SPANWRIGHT_DATA_DIR: join(work, 'data'),
		ADDRESS_HEADER: 'x-forwarded-for',
		XFF_DEPTH: '1',
		NODE_ENV: 'production'
	});
	let bare: ChildProcess | undefined;
	/** One row: the app on `path` against the bare server answering the app's own bytes for it. */
	const row = async (path: string, note: string) => {
		const first = await waitFor(`http://127.0.0.1:${APP_PORT}${path}`, {
			method: 'POST',
			headers: { 'content-type': 'application/json', 'x-forwarded-for': '10.255.255.255' },
			body: JSON.stringify(SHELF)
		});
		if (first.status !== 200) throw new Error(`the app answered ${first.status}`);
		const answer = await first.text();
		const answerFile = join(work, 'answer.json');
		writeFileSync(answerFile, answer);
		bare = start('node', [join(ROOT, 'tests/bench/api/bare-server.mjs')], {
			PORT: String(BARE_PORT),
			ANSWER_FILE: answerFile
		});
		await waitFor(`http://127.0.0.1:${BARE_PORT}/`, { method: 'POST', body: '{}' });

		// warm both up (JIT, the limiter's table), then alternate: bare, app, bare, app …
		await load(APP_PORT, path);
		const runs: { bare: Run; app: Run; ratio: number }[] = [];
		for (let i = 0; i < ROUNDS; i++) {
			const b = await load(BARE_PORT);
			const a = await load(APP_PORT, path);
			runs.push({ bare: b, app: a, ratio: a.rps / b.rps });
		}
		stop(bare);
		bare = undefined;
		// the next row starts its own bare server on the same port once this one has let go of it
		for (let i = 0; i < 50; i++) {
			try {
				await fetch(`http://127.0.0.1:${BARE_PORT}/`, { method: 'POST', body: '{}' });
			} catch {
				break;
			}
			await new Promise((r) => setTimeout(r, 100));
		}
		const f = (n: number, d = 0) => n.toFixed(d).padStart(7);
		console.log(
			`\nPOST ${path} (${answer.length} bytes answered${note}), ${CONNECTIONS} connections, ${SECONDS} s a run, ${ROUNDS} rounds, server: node ${entry}, load average ${loadavg()[0].toFixed(1)}`
		);
		for (const [i, r] of runs.entries())
			console.log(
				`  round ${i + 1}: bare ${f(r.bare.rps)} req/s (p99 ${r.bare.p99} ms)   app ${f(r.app.rps)} req/s (p99 ${r.app.p99} ms, ${r.app.non2xx} not 2xx, ${r.app.errors} errors)   ratio ${r.ratio.toFixed(2)}`
			);
		const ratio = median(runs.map((r) => r.ratio));
		const p99 = median(runs.map((r) => r.app.p99));
		console.log(
			`  median ratio ${ratio.toFixed(2)} (goal ≥ ${GOAL_RATIO}: ${ratio >= GOAL_RATIO ? 'met' : 'NOT met'}), app p99 ${p99} ms (goal ≤ ${GOAL_P99_MS} ms: ${p99 <= GOAL_P99_MS ? 'met' : 'NOT met'})`
		);
	};
	try {
		await row('/api/v1/shelf', '');
		// the opt-in answer without the curve (the bare server answers those bytes too)
		await row('/api/v1/shelf?curve=none', ', the curve left out');
	} finally {
		stop(app);
		if (bare) stop(bare);
		rmSync(work, { recursive: true, force: true });
	}
}

main().then(
	() => process.exit(0),
	(err) => {
		console.error(`api bench could not measure: ${err instanceof Error ? err.message : err}`);
		process.exit(1);
	}
);
