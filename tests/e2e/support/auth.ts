import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'sawdust-and-glue';

/** Sign in with a password through the sign-in page, as a person would. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
	await page.goto('/signin');
	const form = page.locator('form', { has: page.getByLabel('Password') });
	await form.getByLabel('E-mail').fill(email);
	await form.getByLabel('Password').fill(password);
	await form.getByRole('button', { name: /sign in/i }).click();
	await expect(page).not.toHaveURL(/\/signin/);
}

export async function signOut(page: Page) {
	const menu = page.getByRole('button', { name: 'Menu' });
	if (await menu.isVisible()) await menu.click();
	await page.getByRole('button', { name: /sign out/i }).click();
	await expect(page).toHaveURL(/\/(signin)?$/);
}
