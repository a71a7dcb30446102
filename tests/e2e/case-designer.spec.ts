import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// The case designer journey: a builder describes a bookcase, makes one shelf too thin so it fails,
// fixes it with the engine's suggestion, saves, reloads and finds the fixed design stored; a client
// (viewer) reads it with nothing to change; the screen passes axe at phone and desktop widths.

const EDITOR = 'tomas@quillfeather.test';
const VIEWER = 'dana@whitlock-home.test';
// 3/4" in metres: 0.75 × 0.0254 m (the inch is exactly 25.4 mm by definition)
const THREE_QUARTERS_M = 0.01905;

async function firstProject(page: Page) {
	await page.goto('/projects');
	const href = await page.locator('main a[href^="/projects/"]').first().getAttribute('href');
	expect(href).toBeTruthy();
	return href!;
}

const elevation = (page: Page) => page.locator('figure.case-elevation');
const shelfThickness = (page: Page, n: number) =>
	page.getByRole('group', { name: `Shelf ${n}` }).getByLabel('Thickness', { exact: true });

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

test('a case with a failing shelf is fixed by a suggestion, saved and reloaded', async ({
	page,
	browser
}) => {
	await signIn(page, EDITOR);
	const project = await firstProject(page);
	await page.goto(`${project}/case/new`);
	await expect(elevation(page)).toContainText('shelf 3: passes');

	// a 1/2" shelf over the 34 1/2" opening sags past L/144 under 40 lbf/ft²
	await shelfThickness(page, 3).fill('1/2');
	await expect(elevation(page)).toContainText(/shelf 3: fails, over by \d+%/);
	await expect(page.getByRole('status').filter({ hasText: 'checks fail' })).toBeVisible();

	// the engine's first fix for it: stock that is sold thicker
	await page.getByRole('button', { name: /^Make shelf 3 .* thick$/ }).click();
	await expect(elevation(page)).toContainText(/shelf 3: passes, \d+% to spare/);
	await expect(elevation(page)).not.toContainText('fails');
	await expect(shelfThickness(page, 3)).toHaveValue('3/4"');

	await page.locator('#analysis-name').fill('Library bookcase, left');
	await page.getByRole('button', { name: 'Save in the project' }).click();
	await expect(page).toHaveURL(/\/case\/[0-9a-f-]{36}$/);
	const id = page.url().split('/').pop()!;

	await page.reload();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Library bookcase, left');
	await expect(shelfThickness(page, 3)).toHaveValue('3/4"');
	await expect(elevation(page)).toContainText(/shelf 3: passes/);

	// what was stored: the fixed design, recomputed by the server
	const stored = await page.request.get(`/api/v1/analyses/${id}`);
	expect(stored.ok()).toBe(true);
	const body = await stored.json();
	expect(body.kind).toBe('case');
	expect(body.input.shelves[2].thickness).toBeCloseTo(THREE_QUARTERS_M, 9);
	expect(body.input.shelves).toHaveLength(4);
	expect(body.pass).toBe(true);

	// a client reads it: no save, no fixes to apply, no inputs to type into
	const client = await browser.newPage();
	await signIn(client, VIEWER);
	await client.goto(page.url());
	await expect(elevation(client)).toContainText('shelf 3: passes');
	await expect(client.getByRole('button', { name: /save/i })).toHaveCount(0);
	await expect(client.getByRole('button', { name: /add a shelf/i })).toHaveCount(0);
	await expect(client.getByText('You can read this design; editors change it.')).toBeVisible();
	await client.close();
});

for (const [name, size] of [
	['phone', { width: 375, height: 800 }],
	['desktop', { width: 1280, height: 900 }]
] as const) {
	test(`the case designer has no serious accessibility problems (${name})`, async ({ page }) => {
		await page.setViewportSize(size);
		await signIn(page, EDITOR);
		const project = await firstProject(page);
		await page.goto(`${project}/case/new`);
		await shelfThickness(page, 3).fill('1/2');
		await expect(elevation(page)).toContainText('shelf 3: fails');
		expect(await seriousViolations(page)).toEqual([]);
	});
}
