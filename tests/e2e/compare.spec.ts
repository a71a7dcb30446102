import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// The comparison journey: a designer puts three materials into one 36" shelf under the woodwork
// standard's 40 lbf/ft², reads the chart and the table, saves the comparison in the project and
// finds it stored; axe at phone and desktop widths.

const EDITOR = 'tomas@quillfeather.test';
// 3/4" and 36" in metres (1 in = 0.0254 m exactly)
const THREE_QUARTERS_M = 0.01905;
const SPAN_36_M = 0.9144;

async function firstProject(page: Page) {
	await page.goto('/projects');
	const href = await page.locator('main a[href^="/projects/"]').first().getAttribute('href');
	expect(href).toBeTruthy();
	return href!;
}

const table = (page: Page) => page.getByTestId('compare-table');

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

test('a designer compares three materials and saves the comparison', async ({ page }) => {
	await signIn(page, EDITOR);
	const project = await firstProject(page);
	await page.goto(`${project}/compare/new`);
	await expect(table(page).locator('tbody tr')).toHaveCount(2);

	await page.getByRole('button', { name: 'Add a candidate' }).click();
	await page.locator('#cand-2-material').selectOption('red-oak');
	await page.locator('#cand-2-thickness').fill('3/4');
	await expect(table(page).locator('tbody tr')).toHaveCount(3);
	await expect(table(page)).toContainText('3/4" Red oak');
	await expect(table(page)).toContainText('3/4" MDF');

	// the chart's legend names each line, and the keyboard moves its read-out along the span
	const legend = page.getByRole('list', { name: 'Legend' });
	await expect(legend.getByRole('listitem')).toHaveCount(4);
	const chart = page.getByRole('slider');
	await chart.focus();
	await page.keyboard.press('Home');
	await expect(chart).toHaveAttribute('aria-valuetext', /^span 12"$/);
	await page.keyboard.press('End');
	await expect(
		page.locator('[aria-live="polite"]').filter({ hasText: 'At a span of' })
	).toContainText('3/4" Red oak');

	// MDF fails at 36", the plywood and the oak pass: said in words, not colour alone
	const mdf = table(page).locator('tbody tr', { hasText: 'MDF' });
	await expect(mdf).toContainText('✗ fails');
	await expect(table(page).locator('tbody tr', { hasText: 'Red oak' })).toContainText('✓ passes');

	await page.locator('#analysis-name').fill('Library wall: shelf stock');
	await page.getByRole('button', { name: 'Save in the project' }).click();
	await expect(page).toHaveURL(/\/compare\/[0-9a-f-]{36}$/);
	const id = page.url().split('/').pop()!;

	await page.reload();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Library wall: shelf stock');
	await expect(table(page).locator('tbody tr')).toHaveCount(3);
	await expect(table(page)).toContainText('3/4" Red oak');

	const stored = await page.request.get(`/api/v1/analyses/${id}`);
	expect(stored.ok()).toBe(true);
	const body = await stored.json();
	expect(body.kind).toBe('comparison');
	expect(body.input.candidates.map((c: { material: string }) => c.material)).toEqual([
		'hardwood-plywood-veneer-core',
		'mdf',
		'red-oak'
	]);
	expect(body.input.candidates[2].thickness).toBeCloseTo(THREE_QUARTERS_M, 9);
	expect(body.input.shelf.span).toBeCloseTo(SPAN_36_M, 9);
});

for (const [name, size] of [
	['phone', { width: 375, height: 800 }],
	['desktop', { width: 1280, height: 900 }]
] as const) {
	test(`the comparison has no serious accessibility problems (${name})`, async ({ page }) => {
		await page.setViewportSize(size);
		await signIn(page, EDITOR);
		const project = await firstProject(page);
		await page.goto(`${project}/compare/new`);
		await page.getByRole('button', { name: 'Add a candidate' }).click();
		await expect(page.getByTestId('compare-table').locator('tbody tr')).toHaveCount(3);
		expect(await seriousViolations(page)).toEqual([]);
	});
}
