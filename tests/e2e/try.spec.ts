import { expect, test } from '@playwright/test';
import { linkFromMail } from './support/mail';

// Try it before signing up: from the landing page straight to a shelf check with no account, an
// answer as the span is typed, then "keep it": sign up, follow the e-mailed link, and find the
// same shelf saved in a first project, recomputed by the server.

// 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
const INCH_M = 0.0254;

test('a visitor checks a shelf without an account and keeps it by signing up', async ({ page }) => {
	await page.goto('/');
	await page.getByRole('link', { name: 'Check a shelf now' }).click();
	await expect(page).toHaveURL(/\/try$/);
	const answer = page.getByTestId('shelf-answer');
	await expect(answer).toBeVisible();
	await page.getByLabel('Span between supports', { exact: true }).fill('30 1/2');
	await expect(page.getByLabel('Span between supports, read as')).toHaveText('= 30 1/2"');
	await expect(answer).toContainText(/sags/);

	await page.getByRole('button', { name: 'Create an account to keep it' }).click();
	await expect(page).toHaveURL(/\/signup\?next=%2Fkeep|\/signup\?next=\/keep/);
	const email = `visitor.${Date.now()}@example.test`;
	const before = new Date();
	await page.getByLabel('Your name').fill('Ada Visitor');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill('long enough joinery words');
	await page.getByRole('button', { name: /create the account/i }).click();

	const { link } = await linkFromMail(email, before);
	await page.goto(link);
	await expect(page).toHaveURL(/\/projects\/[^/]+\/shelf\/[^/]+$/);
	await expect(page.getByLabel('Span between supports', { exact: true })).toHaveValue('30 1/2"');
	const analysisId = page.url().split('/').at(-1)!;
	const stored = await page.request.get(`/api/v1/analyses/${analysisId}`);
	expect(stored.ok()).toBe(true);
	const body = await stored.json();
	expect(body.kind).toBe('shelf');
	expect(body.input.span).toBeCloseTo(30.5 * INCH_M, 9);
	await page.goto('/projects');
	await expect(page.getByRole('link', { name: 'My first project' })).toBeVisible();
});
