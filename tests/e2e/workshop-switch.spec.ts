import { expect, test } from '@playwright/test';
import { signIn } from './support/auth';

// The workshop switcher in the header, a form like the others: choosing a workshop switches at
// once; with JavaScript off its button sends the same form. The demo owner has her own workshop
// and the shop's (src/lib/server/demo/).

const OWNER = 'ines@quillfeather.test';

test('the switcher moves between the workshops a person belongs to', async ({ page }) => {
	await signIn(page, OWNER);
	await page.goto('/projects');
	const switcher = page.getByLabel('Workshop', { exact: true });
	await expect(switcher.locator('option:checked')).toHaveText('Quillfeather Casework (owner)');
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toBeVisible();

	await switcher.selectOption({ label: 'Ines Moravec’s workshop (owner)' });
	await expect(switcher.locator('option:checked')).toHaveText('Ines Moravec’s workshop (owner)');
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toHaveCount(0);

	await switcher.selectOption({ label: 'Quillfeather Casework (owner)' });
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toBeVisible();
});

test('without JavaScript the switcher’s button sends the form', async ({ browser }) => {
	const context = await browser.newContext({ javaScriptEnabled: false });
	const page = await context.newPage();
	await signIn(page, OWNER);
	await page.goto('/projects');
	const switcher = page.getByLabel('Workshop', { exact: true });
	await switcher.selectOption({ label: 'Ines Moravec’s workshop (owner)' });
	await page.getByRole('button', { name: 'Switch' }).click();
	await expect(page).toHaveURL(/\/projects$/);
	await expect(switcher.locator('option:checked')).toHaveText('Ines Moravec’s workshop (owner)');
	await switcher.selectOption({ label: 'Quillfeather Casework (owner)' });
	await page.getByRole('button', { name: 'Switch' }).click();
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toBeVisible();
	await context.close();
});
