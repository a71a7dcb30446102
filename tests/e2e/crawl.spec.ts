import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// A crawl of every page each demo role can reach: from the start page, follow every same-origin
// link (GET only, no form is ever submitted), and no page answers 404 or 500. Then every saved
// analysis of the demo opens in its kind's own screen. Demo accounts:
// src/lib/server/demo/accounts.ts (the demo has no class workshop, so no student).

const ROLES = [
	{ role: 'owner', email: 'ines@quillfeather.test' },
	{ role: 'editor', email: 'tomas@quillfeather.test' },
	{ role: 'viewer', email: 'noor@quillfeather.test' },
	{ role: 'client', email: 'dana@whitlock-home.test' }
];

// Links the crawl does not follow: signing out ends the session; files are downloads, not pages;
// the development mail catcher is not part of the app.
const SKIP = [/^\/signout/, /\.pdf$/, /\/file$/, /^\/dev\//, /^\/api\//];
// At most this many pages in all, and this many query-string variants of one path (sort and page
// links of the lists would otherwise multiply).
const MAX_PAGES = 120;
const MAX_VARIANTS = 3;

// The roles crawl side by side.
test.describe.configure({ mode: 'parallel' });

// The links of a page as the server rendered it (every page is rendered on the server, so its
// links are in its HTML): <a href> without a download attribute, entities decoded.
function linksOf(html: string, base: string): URL[] {
	const out: URL[] = [];
	for (const [tag] of html.matchAll(/<a\b[^>]*>/gi)) {
		if (/\sdownload(\s|=|>)/i.test(tag)) continue;
		const href = /\shref="([^"]*)"/i.exec(tag)?.[1];
		if (href === undefined) continue;
		const decoded = href
			.replace(/&amp;/g, '&')
			.replace(/&quot;/g, '"')
			.replace(/&#39;/g, "'");
		out.push(new URL(decoded, base));
	}
	return out;
}

// Pages are fetched with the signed-in browser's cookies but not rendered: the statuses and the
// server-rendered links are what the crawl checks, and a fetch is a fraction of a page load.
async function crawl(page: Page) {
	const origin = new URL(page.url()).origin;
	const seen = new Set<string>(['/']);
	const variants = new Map<string, number>();
	const queue = ['/'];
	const failures: string[] = [];
	let visited = 0;
	while (queue.length && visited < MAX_PAGES) {
		const path = queue.shift()!;
		const response = await page.request.get(path, { headers: { accept: 'text/html' } });
		visited++;
		const status = response.status();
		if (status === 404 || status >= 500) failures.push(`${status} ${path}`);
		if (!(response.headers()['content-type'] ?? '').startsWith('text/html')) continue;
		for (const url of linksOf(await response.text(), response.url())) {
			if (url.origin !== origin) continue;
			const next = url.pathname + url.search;
			if (seen.has(next) || SKIP.some((re) => re.test(url.pathname))) continue;
			seen.add(next);
			const count = variants.get(url.pathname) ?? 0;
			if (url.search && count >= MAX_VARIANTS) continue;
			variants.set(url.pathname, count + 1);
			queue.push(next);
		}
	}
	return { failures, visited };
}

for (const { role, email } of ROLES) {
	test(`the ${role} reaches no missing or broken page`, async ({ page }) => {
		test.setTimeout(180_000);
		await signIn(page, email);
		const { failures, visited } = await crawl(page);
		expect(failures).toEqual([]);
		// the crawl went past the start page: the projects list and at least one project
		expect(visited).toBeGreaterThan(3);
	});
}

test('every saved analysis of the demo opens in its own screen', async ({ page }) => {
	test.setTimeout(120_000);
	await signIn(page, 'ines@quillfeather.test');
	const me = await (await page.request.get('/api/v1/me')).json();
	const workshop = me.workshops[0].id;
	const projects = await (
		await page.request.get(`/api/v1/projects?workshop=${workshop}&perPage=100`)
	).json();
	let opened = 0;
	for (const project of projects.items) {
		const list = await (
			await page.request.get(`/api/v1/projects/${project.id}/analyses?perPage=100`)
		).json();
		for (const analysis of list.items) {
			const response = await page.goto(`/projects/${project.id}/analyses/${analysis.id}`);
			expect(response?.status(), `${analysis.kind} ${analysis.name}`).toBe(200);
			expect(new URL(page.url()).pathname).toMatch(
				new RegExp(`^/projects/${project.id}/[a-z]+/${analysis.id}$`)
			);
			await expect(page.getByRole('heading', { level: 1 })).toHaveText(analysis.name);
			opened++;
		}
	}
	// the demo saves at least one analysis of each kind it has a screen for
	expect(opened).toBeGreaterThanOrEqual(5);
});
