import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// The shelf check's inputs as a builder meets them: a result for an earlier input never stands as
// current, the marked field is named at the top with a link to it, a change of how the load lies
// carries the value over in the new unit, and a wall-hung shelf asks for its reach and its width.

const EDITOR = 'tomas@quillfeather.test';

async function newShelf(page: Page) {
	await signIn(page, EDITOR);
	await page.goto('/projects');
	const href = await page.locator('main a[href^="/projects/"]').first().getAttribute('href');
	await page.goto(`${href}/shelf/new`);
	await expect(page.getByTestId('shelf-answer')).toBeVisible();
}

test('a stale result is replaced and the marked field is named at the top', async ({ page }) => {
	await newShelf(page);
	await page.getByLabel('Depth, front to back', { exact: true }).fill('11 1/4 bananas');
	await expect(page.getByTestId('stale-result')).toContainText('Fix the marked field');
	await expect(page.getByTestId('shelf-answer')).toHaveCount(0);
	const summary = page.getByTestId('error-summary');
	await expect(summary).toBeVisible();
	await summary.getByRole('link', { name: 'Depth' }).click();
	await expect(page.getByLabel('Depth, front to back', { exact: true })).toBeFocused();
	await page.getByLabel('Depth, front to back', { exact: true }).fill('11 1/4');
	await expect(page.getByTestId('shelf-answer')).toBeVisible();
	await expect(summary).toHaveCount(0);
});

test('a spread load becomes a point load of the same total, in pounds', async ({ page }) => {
	await newShelf(page);
	// 40 lbf/ft² over 36" × 11 1/4" (3 ft × 0.9375 ft) is 112.5 lbf
	await page.getByRole('radio', { name: 'At one place' }).check();
	await expect(page.getByLabel('Load', { exact: true })).toHaveValue('112.5 lbf');
	await expect(page.getByText(/Carried over as the same total load/)).toBeVisible();
	await expect(page.getByTestId('shelf-answer')).toBeVisible();
});

test('a wall-hung shelf asks for its reach from the wall and its width along it', async ({
	page
}) => {
	await newShelf(page);
	await page.getByRole('radio', { name: 'Wall-hung (cantilever)' }).check();
	await expect(
		page.getByLabel('Reach out from the wall, front to back', { exact: true })
	).toBeVisible();
	await expect(page.getByLabel('Width along the wall', { exact: true })).toBeVisible();
	await expect(page.getByLabel('Span between supports', { exact: true })).toHaveCount(0);
});
