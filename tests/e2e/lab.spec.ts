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
});

test('the lab works on a phone', async ({ page }) => {
	await page.setViewportSize({ width: 375, height: 800 });
	await page.goto('/lab');
	const overflow = await page.evaluate(() => document.documentElement.scrollWidth);
	expect(overflow).toBeLessThanOrEqual(375);
	await page.getByRole('button', { name: 'More span' }).click();
	await expect(readout(page)).toContainText('A 36 1/2" Red oak shelf');
	expect(await seriousViolations(page)).toEqual([]);
});
