import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Browser, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// A class session as a teacher and two students would run it: the teacher starts it from the lab's
// span experiment on a 1920×1080 projector, two phones (375 px, no account) join with the code and
// answer, the teacher's screen shows both answers as they arrive, reveals the engine's answer (the
// phones show it too) and ends the session, after which the phones say it has ended.

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

async function phone(browser: Browser, code: string, nickname: string, choice: RegExp) {
	const context = await browser.newContext({ viewport: { width: 375, height: 740 } });
	const page = await context.newPage();
	await page.goto('/c');
	await page.getByLabel(/join code/i).fill(code.toLowerCase());
	await page.getByRole('button', { name: 'Join' }).click();
	await expect(page).toHaveURL(new RegExp(`/c/${code}$`));
	await page.getByLabel('Your nickname').fill(nickname);
	await page.getByRole('button', { name: 'Join' }).click();
	await expect(page.getByText(`You are ${nickname}`)).toBeVisible();
	await page.getByRole('radio', { name: choice }).check();
	await page.getByRole('button', { name: 'Send my answer' }).click();
	await expect(page.getByText(/^Sent:/)).toBeVisible();
	// nothing wider than the phone
	const width = await page.evaluate(() => document.documentElement.scrollWidth);
	expect(width).toBeLessThanOrEqual(375);
	return page;
}

test('a teacher starts a session, two phones join and answer, the answers arrive, the answer is revealed and the session ends', async ({
	browser
}) => {
	const teacher = await (
		await browser.newContext({ viewport: { width: 1920, height: 1080 } })
	).newPage();
	await signIn(teacher, 'ines@quillfeather.test');
	await teacher.goto('/lab');
	const ask = teacher.getByRole('link', { name: 'Ask a class…' });
	// the choice takes effect once the page has hydrated
	await expect(async () => {
		await teacher.getByRole('combobox', { name: 'Experiment' }).selectOption('span');
		await expect(ask).toBeVisible({ timeout: 1000 });
	}).toPass();
	await ask.click();
	await expect(teacher).toHaveURL(/\/class\?experiment=span$/);
	await expect(teacher.getByRole('radio', { name: /Span: what length does/ })).toBeChecked();
	await teacher.getByRole('button', { name: 'Start the session' }).click();
	await expect(teacher).toHaveURL(/\/class\/[\w-]+$/);
	await expect(teacher.getByRole('heading', { name: /We double the span to 48"/ })).toBeVisible();
	const code = (await teacher.locator('.code').textContent())!.trim();
	expect(code).toMatch(/^[A-HJ-NP-Z2-9]{6}$/);
	await expect(
		teacher.getByRole('img', { name: new RegExp(`QR code of .*/c/${code}`) })
	).toBeVisible();
	expect(await seriousViolations(teacher)).toEqual([]);

	const ana = await phone(browser, code, 'Ana', /About 16 times as much/);
	expect(await seriousViolations(ana)).toEqual([]);
	const ben = await phone(browser, code, 'Ben', /About 4 times as much/);

	// both answers arrive on the teacher's screen without a reload
	await expect(teacher.getByText('2 of 2 students answered')).toBeVisible();
	const who = teacher.getByRole('list', { name: 'Answers by nickname' });
	await expect(who.getByRole('listitem')).toHaveCount(2);
	await expect(who.getByText('Ana')).toBeVisible();
	await expect(who.getByText('Ben')).toBeVisible();
	await expect(who.getByLabel('answered D')).toBeVisible(); // Ana: 16 times, the fourth choice
	await expect(who.getByLabel('answered B')).toBeVisible(); // Ben: 4 times

	// the engine's answer: twice the span under books, about 16 times the sag
	await teacher.getByRole('button', { name: 'Reveal the answer' }).click();
	await expect(
		teacher.getByRole('status').filter({ hasText: /^Answer: about 16 times as much/ })
	).toBeVisible();
	await expect(ana.getByText(/You said so too/)).toBeVisible();
	await expect(ben.getByText(/You said “about 4 times as much”/)).toBeVisible();

	await teacher.getByRole('button', { name: 'Next step' }).click();
	await expect(teacher.getByText(/No question at this step/)).toBeVisible();
	await expect(ana.getByText(/No question at this step/)).toBeVisible();

	await teacher.getByRole('button', { name: 'End the session…' }).click();
	await teacher.getByRole('alertdialog').getByRole('button', { name: 'End the session' }).click();
	await expect(teacher).toHaveURL(/\/class\?ended=1$/);
	await expect(ana.getByRole('heading', { name: 'The session has ended' })).toBeVisible();
	await expect(ben.getByRole('heading', { name: 'The session has ended' })).toBeVisible();
	const gone = await ana.request.get(`/api/v1/class/${code}`);
	expect(gone.status()).toBe(404);
});
