import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';

// The teaching lab, as a teacher and a student would use it without an account: move the span
// slider and watch the drawing, the ghost and the laws follow; step through the span experiment
// with the keyboard and see the answer the engine gives; the projector view at 1920×1080 and the
// lab on a 375 px phone, each checked with axe.

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

const readout = (page: Page) => page.locator('.readout');

test('the lab redraws on every movement and states the law from the engine', async ({ page }) => {
	await page.goto('/lab');
	await expect(page.getByRole('heading', { name: 'Shelf lab' })).toBeVisible();
	await expect(readout(page)).toContainText('A 36" Red oak shelf');
	await expect(page.getByText('Twice the span → 16 times the sag')).toBeVisible();
	await expect(page.getByText('Red oak is about 5 times stiffer than MDF')).toBeVisible();
	const before = await page.locator('svg.lab-shelf path.shelf').getAttribute('d');
	await expect(page.locator('svg.lab-shelf path.ghost')).toHaveCount(0);

	const span = page.getByRole('slider', { name: 'Span' });
	await expect(span).toHaveAttribute('aria-valuetext', '36"');
	await span.focus();
	for (let i = 0; i < 4; i++) await page.keyboard.press('ArrowRight');
	await expect(span).toHaveAttribute('aria-valuetext', '38"');
	await expect(readout(page)).toContainText('A 38" Red oak shelf');
	await expect(page.locator('svg.lab-shelf path.ghost')).toHaveCount(1);
	expect(await page.locator('svg.lab-shelf path.shelf').getAttribute('d')).not.toBe(before);

	// the stepper and the exaggeration, stated and fixed
	await page.getByRole('button', { name: 'More thickness' }).click();
	await expect(page.getByRole('slider', { name: 'Thickness' })).toHaveAttribute(
		'aria-valuetext',
		'13/16"'
	);
	await expect(page.locator('svg.lab-shelf')).toHaveAttribute('data-exaggeration', '50');
	await page.getByLabel('Lock the exaggeration').check();
	await expect(page.getByLabel('Sag drawn')).toBeDisabled();

	// one weight in the middle: the law follows the load
	await page.getByLabel('One weight').check();
	await expect(page.getByText('Twice the span → 8 times the sag')).toBeVisible();
});

test('a teacher steps through the span experiment from the keyboard', async ({ page }) => {
	await page.setViewportSize({ width: 1920, height: 1080 });
	await page.goto('/lab?view=projector');
	await expect(page.getByRole('link', { name: 'Projector view', exact: true })).toHaveCount(0);
	await page.getByRole('combobox', { name: 'Experiment' }).selectOption('span');
	await expect(
		page.getByText('Predict: We double the span to 48". What happens to the sag?')
	).toBeVisible();
	await page.locator('body').click({ position: { x: 5, y: 5 } });
	await page.keyboard.press(' ');
	await expect(page.getByText('Step 2 of 4')).toBeVisible();
	await expect(
		page.getByText(/Answer: about 16 times as much — the engine finds 16 times the sag/)
	).toBeVisible();
	await expect(readout(page)).toContainText('A 48" Red oak shelf');
	await page.keyboard.press(' ');
	await page.keyboard.press(' ');
	await expect(page.getByText(/Answer: about 8 times as much/)).toBeVisible();
	// arrows move the chosen variable (span) when no control has the focus
	await page.locator('body').click({ position: { x: 5, y: 5 } });
	await page.keyboard.press('ArrowLeft');
	await expect(page.getByRole('slider', { name: 'Span' })).toHaveAttribute(
		'aria-valuetext',
		'47 1/2"'
	);
	await page.screenshot({ path: 'test-results/lab-projector.png' });
	expect(await seriousViolations(page)).toEqual([]);

	// large type for the back of the room: the drawing's stated exaggeration and the chart's
	// numbers at least 20 px, the laws larger still
	const note = await page.locator('svg.lab-shelf text.note').first().boundingBox();
	expect(note!.height).toBeGreaterThanOrEqual(20);
	const tick = await page.locator('.lab-chart text.tick').first().boundingBox();
	expect(tick!.height).toBeGreaterThanOrEqual(18);
	const law = await page.locator('.laws strong').first().boundingBox();
	expect(law!.height).toBeGreaterThanOrEqual(24);
});

test('choosing an experiment hands the keyboard to it at once', async ({ page }) => {
	await page.setViewportSize({ width: 1920, height: 1080 });
	await page.goto('/lab?view=projector');
	await page.getByRole('combobox', { name: 'Experiment' }).selectOption('thickness');
	// no click anywhere: space steps and the arrows move the chosen variable
	await page.keyboard.press(' ');
	await expect(page.getByText('Step 2 of 2')).toBeVisible();
	await expect(readout(page)).toContainText('A 36" Red oak shelf, 1 1/2" thick');
	await page.keyboard.press('ArrowRight');
	await expect(readout(page)).toContainText('A 36 1/2" Red oak shelf, 1 1/2" thick');
	// a focused button keeps space for itself but lets the arrows through
	await page.getByRole('button', { name: 'Back' }).focus();
	await page.keyboard.press('ArrowRight');
	await expect(readout(page)).toContainText('A 37" Red oak shelf');
	await page.keyboard.press(' ');
	await expect(page.getByText('Step 1 of 2')).toBeVisible();
});

test('the lab works on a phone', async ({ page }) => {
	await page.setViewportSize({ width: 375, height: 800 });
	await page.goto('/lab');
	const overflow = await page.evaluate(() => document.documentElement.scrollWidth);
	expect(overflow).toBeLessThanOrEqual(375);
	await page.getByRole('button', { name: 'More span' }).click();
	await expect(readout(page)).toContainText('A 36 1/2" Red oak shelf');
	expect(await seriousViolations(page)).toEqual([]);

	// the last control, moved at the bottom of the list: the drawing stays in view above it
	const time = page.getByRole('slider', { name: 'Time under load' });
	await time.focus();
	await page.keyboard.press('Home');
	await expect(time).toHaveAttribute('aria-valuetext', 'the moment it is loaded');
	const drawing = (await page.locator('svg.lab-shelf').boundingBox())!;
	const slider = (await time.boundingBox())!;
	expect(drawing.y).toBeGreaterThanOrEqual(0);
	expect(drawing.y + drawing.height).toBeLessThanOrEqual(slider.y);
	expect(slider.y + slider.height).toBeLessThanOrEqual(800);
	await expect(page.locator('svg.lab-shelf text.sag')).toHaveText(/when loaded/);
	// its words stay readable on the small screen (at least 12 px)
	const label = await page.locator('svg.lab-shelf text.load').boundingBox();
	expect(label!.height).toBeGreaterThanOrEqual(12);
});
