// Browser benchmark: how long a span change takes to reach the screen, in Debian's Chromium, on
// the shelf check (the elevation drawing), the comparison (the sag chart) and the teaching lab
// (its span slider to the lab's drawing and chart); and how long the wall screen takes from a new
// saw kerf to redrawn sheet layouts (the demo wall's 70 parts checked, listed and nested again in
// the page: issue 10 asks for well under a second). Run by
// tests/bench/run.sh after `npx vite build`; it builds nothing itself. It reports, it never fails
// on a slow number: the exit code says only whether the measurement could be made.
//
// Each sample starts inside a requestAnimationFrame callback (where a slider's input lands in
// Chromium, which aligns input to frames), sets the span field's text and dispatches `input`, and
// ends in the first task after that frame has run style, layout and paint: the span change is
// then on screen. A sample counts only if the drawing's or the chart's SVG changed in it.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Page } from 'playwright-core';

const PORT = Number(process.env.BENCH_PORT ?? 4471);
const MAIL_PORT = Number(process.env.BENCH_MAIL_PORT ?? 2871);
const DATA_DIR = join(process.cwd(), 'tests', '.tmp', `bench-data-${PORT}`);
const BASE = `http://localhost:${PORT}`;
const WARMUP = 8;
const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 60);
const TARGET_MS = 16; // issue 5: "under 16 ms at the median, so a slider feels continuous"
// Demo scenario accounts (invented, src/lib/server/demo/accounts.ts): the shop's editor.
const EDITOR = { email: 'tomas@quillfeather.test', password: 'sawdust-and-glue' };

/** Saw kerfs to type on the wall screen, each different from the one before. */
const KERFS = ['1/8"', '3/32"', '5/32"', '1/16"', '3/16"'];
const kerfText = (i: number) => KERFS[i % KERFS.length];
const WALL_TARGET_MS = 1000;

/** The lab's span slider positions, 24 to 47.5 inches by halves, as the range input takes them. */
function labSpan(i: number): string {
	return String(24 + (i % 48) / 2);
}

/** Spans to type, 24" to 47 1/2" by half inches: every sample differs from the one before. */
function spanText(i: number): string {
	const halves = 48 + (i % 48);
	return halves % 2 ? `${(halves - 1) / 2} 1/2"` : `${halves / 2}"`;
}

function startServer(): ChildProcess {
	rmSync(DATA_DIR, { recursive: true, force: true });
	// The same server the browser journeys use (tests/e2e/support/server.ts): the build, a fresh
	// data folder with the demo scenario and a mail catcher, on ports of its own.
	const child = spawn('npx', ['tsx', 'tests/e2e/support/server.ts'], {
		env: {
			...process.env,
			E2E_PORT: String(PORT),
			E2E_MAIL_PORT: String(MAIL_PORT),
			E2E_DATA_DIR: DATA_DIR
		},
		stdio: ['ignore', 'pipe', 'pipe'],
		detached: true
	});
	const log: string[] = [];
	child.stdout?.on('data', (d) => log.push(String(d)));
	child.stderr?.on('data', (d) => log.push(String(d)));
	child.on('exit', (code) => {
		if (code) process.stderr.write(`bench server exited with ${code}:\n${log.join('')}\n`);
	});
	return child;
}

/** SIGTERM to the group (npx, tsx, node), then SIGKILL: the mail catcher outlives a SIGTERM. */
async function stopServer(child: ChildProcess) {
	const group = child.pid;
	const signal = (sig: NodeJS.Signals | 0) => {
		try {
			if (group) process.kill(-group, sig);
			return true;
		} catch {
			return false; // the group is gone
		}
	};
	if (signal('SIGTERM')) {
		for (let i = 0; i < 20 && signal(0); i++) {
			await new Promise((r) => setTimeout(r, 100));
		}
		signal('SIGKILL');
	}
	rmSync(DATA_DIR, { recursive: true, force: true });
}

async function waitForHealth(child: ChildProcess, timeoutMs = 120_000) {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		if (child.exitCode !== null) throw new Error('the bench server stopped before it was ready');
		try {
			const res = await fetch(`${BASE}/api/v1/health`);
			if (res.ok) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 250));
	}
	throw new Error(`no answer from ${BASE}/api/v1/health within ${timeoutMs / 1000} s`);
}

// Runs in the page. Kept as a string so the TypeScript compiler's helpers never reach the browser.
const MEASURE = `({ input, screen, value }) => new Promise((resolve) => {
	const field = document.querySelector(input);
	const area = document.querySelector(screen);
	if (!field || !area) return resolve({ changed: false, domMs: NaN, frameMs: NaN });
	requestAnimationFrame(() => {
		let domAt = NaN;
		const seen = new MutationObserver((records) => {
			for (const r of records) {
				const node = r.target.nodeType === 1 ? r.target : r.target.parentElement;
				if (node && node.closest('svg[role=img]') && Number.isNaN(domAt)) domAt = performance.now();
			}
		});
		seen.observe(area, { subtree: true, childList: true, attributes: true, characterData: true });
		const t0 = performance.now();
		field.value = value;
		field.dispatchEvent(new Event('input', { bubbles: true }));
		// Svelte updates the DOM in a microtask, before this frame's style, layout and paint;
		// a message posted now is handled in the first task after that frame.
		const after = new MessageChannel();
		after.port1.onmessage = () => {
			const t1 = performance.now();
			seen.disconnect();
			resolve({ changed: !Number.isNaN(domAt), domMs: domAt - t0, frameMs: t1 - t0 });
		};
		after.port2.postMessage(0);
	});
})`;

interface Sample {
	changed: boolean;
	domMs: number;
	frameMs: number;
}

async function measure(
	page: Page,
	input: string,
	screen: string,
	label: string,
	valueOf: (i: number) => string = spanText,
	count = SAMPLES
) {
	const run = (value: string) =>
		page.evaluate(`(${MEASURE})(${JSON.stringify({ input, screen, value })})`) as Promise<Sample>;
	const samples: Sample[] = [];
	for (let i = 0; i < WARMUP + count; i++) {
		const sample = await run(valueOf(i));
		if (i >= WARMUP) samples.push(sample);
		// let the shelf check's deferred advice (a 120 ms timer) run outside the next sample
		await page.waitForTimeout(250);
	}
	const ok = samples.filter((s) => s.changed);
	// when the screen did not follow, say what the field said (its reading or its error)
	const field = page
		.locator(input)
		.locator('xpath=ancestor::div[contains(@class,"quantity-input")]');
	const said =
		ok.length < samples.length && (await field.count())
			? (await field.innerText()).replace(/\s+/g, ' ')
			: '';
	return { label, samples: samples.length, unchanged: samples.length - ok.length, ok, said };
}

function quantile(sorted: number[], q: number): number {
	if (!sorted.length) return NaN;
	return sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)];
}

function report(r: Awaited<ReturnType<typeof measure>>, target = TARGET_MS) {
	const fmt = (n: number) => (Number.isNaN(n) ? '—' : n.toFixed(1).padStart(6));
	const row = (what: string, values: number[]) => {
		const s = [...values].sort((a, b) => a - b);
		const median = quantile(s, 0.5);
		const verdict = Number.isNaN(median) ? '' : median < target ? 'under target' : 'OVER target';
		return `  ${what.padEnd(22)} median ${fmt(median)}  p90 ${fmt(quantile(s, 0.9))}  max ${fmt(s.at(-1) ?? NaN)} ms   (target < ${target} ms at the median: ${verdict})`;
	};
	console.log(`${r.label}: ${r.ok.length} of ${r.samples} samples changed the SVG`);
	console.log(
		row(
			'to the rendered frame',
			r.ok.map((s) => s.frameMs)
		)
	);
	console.log(
		row(
			'to the SVG in the DOM',
			r.ok.map((s) => s.domMs)
		)
	);
	if (r.unchanged) {
		console.log(`  ${r.unchanged} samples left the SVG unchanged (not counted)`);
		console.log(`  the span field after the last one: ${r.said}`);
	}
}

async function main() {
	if (!existsSync(join(process.cwd(), 'build', 'index.js'))) {
		console.error('No build/index.js: run `npx vite build` first (tests/bench/run.sh does).');
		process.exit(1);
	}
	const server = startServer();
	const stop = () => stopServer(server);
	process.on('SIGINT', () => void stop().then(() => process.exit(130)));
	let browser;
	try {
		await waitForHealth(server);
		browser = await chromium.launch({
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: [
				'--headless',
				'--no-sandbox',
				'--disable-gpu',
				'--disable-quic',
				'--no-first-run',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync'
			]
		});
		const context = await browser.newContext({
			baseURL: BASE,
			viewport: { width: 1280, height: 900 }
		});
		const page = await context.newPage();
		page.on('pageerror', (err) => console.error(`page error: ${err.message}`));

		// Sign in as a person would (tests/e2e/support/auth.ts).
		await page.goto('/signin');
		const form = page.locator('form', { has: page.getByLabel('Password') });
		await form.getByLabel('E-mail').fill(EDITOR.email);
		await form.getByLabel('Password').fill(EDITOR.password);
		await form.getByRole('button', { name: /sign in/i }).click();
		await page.waitForURL((url) => !url.pathname.startsWith('/signin'));

		// A demo project the editor may change, found through the API with the page's session.
		const me = (await (await context.request.get('/api/v1/me')).json()) as {
			workshops: { id: string; role: string }[];
		};
		let projectId: string | null = null;
		for (const w of me.workshops.filter((w) => w.role !== 'viewer')) {
			const res = await context.request.get(`/api/v1/projects?workshop=${w.id}`);
			const list = (await res.json()) as { items: { id: string }[] };
			projectId = list.items[0]?.id ?? null;
			if (projectId) break;
		}
		if (!projectId) throw new Error('the demo editor has no project to open');

		await page.goto(`/projects/${projectId}/shelf/new`);
		await page.waitForLoadState('networkidle'); // hydrated: the field answers input
		await page.locator('.shelf-drawing svg[role="img"]').waitFor();
		const shelf = await measure(
			page,
			'#shelf-span',
			'section[aria-labelledby="drawing-h"]',
			'Shelf check (/projects/{id}/shelf/new), span → elevation drawing'
		);

		await page.goto(`/projects/${projectId}/compare/new`);
		await page.waitForLoadState('networkidle');
		await page.locator('.sag-chart svg[role="img"]').waitFor();
		const compare = await measure(
			page,
			'#cmp-span',
			'section[aria-labelledby="chart-h"]',
			'Comparison (/projects/{id}/compare/new), span → sag chart'
		);

		// the lab needs no account; its span slider is the first range input
		await page.goto('/lab');
		await page.waitForLoadState('networkidle');
		await page.locator('svg.lab-shelf').waitFor();
		const lab = await measure(
			page,
			'.lab-slider input[type=range]',
			'.lab',
			'Teaching lab (/lab), span slider → lab drawing and chart',
			labSpan
		);

		// the wall screen starts from the demo wall; a new kerf re-nests every sheet
		await page.goto(`/projects/${projectId}/wall/new`);
		await page.waitForLoadState('networkidle');
		await page.locator('section[aria-labelledby="sheets-h"] svg[role="img"]').first().waitFor();
		const wall = await measure(
			page,
			'input[name="sheets.kerf"]',
			'section[aria-labelledby="sheets-h"]',
			'Wall of cases (/projects/{id}/wall/new), saw kerf → check, cut list and sheet layouts',
			kerfText,
			Math.min(SAMPLES, 20)
		);

		const version = browser.version();
		console.log(
			`\nSpan input to screen, Chromium ${version} headless, ${WARMUP} warm-up runs then ${SAMPLES} samples each`
		);
		report(shelf);
		report(compare);
		report(lab);
		report(wall, WALL_TARGET_MS);
		// a screen that never followed the input is a broken page, not a slow one
		const dead = [shelf, compare, lab, wall].filter((r) => r.ok.length === 0).map((r) => r.label);
		if (dead.length) throw new Error(`no sample changed the SVG on: ${dead.join('; ')}`);
	} finally {
		await browser?.close();
		await stop();
	}
}

main().then(
	() => process.exit(0),
	(err) => {
		console.error(
			`shelf-input bench could not measure: ${err instanceof Error ? err.message : err}`
		);
		process.exit(1);
	}
);
