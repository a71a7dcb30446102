import { expect, test } from '@playwright/test';

// Offline in the shop and the classroom: after one visit the service worker keeps the app's
// files and the public lab and shelf check; with the network gone both still compute, and the
// app says it is offline and what will not work.

test('the lab and the shelf check compute offline after a first visit', async ({
	page,
	context
}) => {
	await page.goto('/lab');
	await page.evaluate(async () => {
		await navigator.serviceWorker.ready;
	});
	// the worker controls the page once it has claimed it
	await page.reload();
	await expect
		.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller)))
		.toBe(true);

	await context.setOffline(true);
	await page.goto('/lab');
	const notice = page.getByRole('status').filter({ hasText: 'You are offline.' });
	await expect(notice).toBeVisible();
	// toContainText reads the text as shown (line breaks in the source collapse to spaces)
	await expect(notice).toContainText(
		'Signing in, saving, your projects and class sessions need the network'
	);
	const readout = page.locator('.readout');
	await expect(readout).toContainText('A 36" Red oak shelf');
	await page.getByRole('button', { name: 'More span' }).click();
	await expect(readout).toContainText('A 36 1/2" Red oak shelf');
	await expect(page.getByText('Twice the span → 16 times the sag')).toBeVisible();

	await page.goto('/try');
	await expect(page.getByRole('heading', { name: 'Will this shelf sag?' })).toBeVisible();
	const answer = page.getByTestId('shelf-answer');
	await expect(answer).toBeVisible();
	const before = await answer.innerText();
	const span = page.getByLabel('Span between supports', { exact: true });
	await span.fill('30"');
	await expect(answer).not.toHaveText(before);

	await context.setOffline(false);
	await page.goto('/lab');
	await expect(page.getByText('You are offline.')).toHaveCount(0);
});
