import { expect, test, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { signIn } from './support/auth';
import { E2E_MAIL_DIR } from './support/env';
import { waitForMailTo } from '../../src/lib/server/dev/caught-mail';

// Journey 4, "send it to the client": an editor opens a saved case, sends its record (the mail is
// caught with the PDF, whose text holds the verdict and the anchoring steps), the client follows
// the link and reads it; a share link opens without an account and answers 404 once closed; the
// demo client reaches no other client's name; the printed record has no navigation or controls.

const EDITOR = 'tomas@quillfeather.test';
const CLIENT = 'dana@whitlock-home.test';
// the shop's other clients in the demo scenario (src/lib/server/demo/seed.ts)
const OTHER_CLIENTS = ['Harbour Street', 'Osei', 'Kiln Lane', 'Teacher cabinet', 'pantry'];

function pdfText(file: string) {
	return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-']).toString().replace(/\s+/g, ' ');
}

async function projectNamed(page: Page, name: string) {
	await page.goto('/projects');
	const href = await page.getByRole('link', { name, exact: true }).first().getAttribute('href');
	expect(href).toBeTruthy();
	return href!;
}

test('an editor sends a case record; the mail holds the PDF; the client reads it from the link', async ({
	page,
	browser
}) => {
	await signIn(page, EDITOR);
	// the shop's editor reads every project of the workshop
	await page.goto(await projectNamed(page, 'Harbour Street school reading nook'));
	await page.getByRole('link', { name: 'Teacher cabinet', exact: true }).click();
	await expect(page).toHaveURL(/\/case\//);
	await page.getByRole('link', { name: 'Record', exact: true }).click();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(
		'Harbour Street school reading nook'
	);
	const verdict = (await page.getByTestId('record-verdict').first().textContent())!
		.replace(/\s+/g, ' ')
		.trim();
	expect(verdict).toContain('Passes.');
	const firstStep = (await page.locator('.record-steps li').first().textContent())!.trim();
	expect(firstStep).toMatch(/wall/);

	const to = 'facilities@harbour-street.test';
	const before = new Date();
	await page.getByLabel("Client's e-mail").fill(to);
	await page.getByLabel('A short message (optional)').fill('The cabinet as we will build it.');
	await page.getByRole('button', { name: 'Send the record' }).click();
	await expect(page.getByRole('status').filter({ hasText: `Sent to ${to}` })).toBeVisible();

	const mail = await waitForMailTo(to, { dir: E2E_MAIL_DIR, after: before, timeoutMs: 15000 });
	expect(mail.text).toContain('The cabinet as we will build it.');
	expect(mail.attachments?.[0]?.contentType).toBe('application/pdf');
	const text = pdfText(mail.attachments![0].path);
	expect(text).toContain(verdict.replace(/^✓ /, ''));
	expect(text).toContain(firstStep.replace(/\s+/g, ' '));
	const link = mail.links.find((l) => l.includes('/shared/'))!;
	expect(link).toBeTruthy();

	// the client has no account: the link opens the record and nothing else
	const reader = await browser.newPage();
	await reader.goto(link);
	await expect(reader.getByRole('heading', { level: 1 })).toHaveText(
		'Harbour Street school reading nook'
	);
	await expect(reader.getByTestId('record-verdict').first()).toContainText('Passes.');
	await expect(reader.locator('nav')).toHaveCount(0);
	await reader.close();

	// the project says when and to whom it went
	await page.goto(await projectNamed(page, 'Harbour Street school reading nook'));
	await expect(page.getByText(`to ${to}`)).toBeVisible();
});

test('a share link opens without an account and answers 404 once closed', async ({
	page,
	browser
}) => {
	await signIn(page, EDITOR);
	await page.goto(`${await projectNamed(page, 'Whitlock library wall')}/record`);
	await page.getByLabel('Works for (days)').fill('7');
	await page.getByRole('button', { name: 'Make a link' }).click();
	const link = await page.getByTestId('new-share-link').inputValue();
	expect(link).toMatch(/\/shared\/[A-Za-z0-9_-]{43}$/);

	const anyone = await browser.newPage();
	const opened = await anyone.goto(link);
	expect(opened?.status()).toBe(200);
	await expect(anyone.getByRole('heading', { level: 1 })).toHaveText('Whitlock library wall');

	await page.reload();
	await page
		.getByRole('button', { name: /^Close/ })
		.first()
		.click();
	await expect(page.getByRole('button', { name: /^Close/ })).toHaveCount(0);

	const closed = await anyone.goto(link);
	expect(closed?.status()).toBe(404);
	await expect(anyone.getByText('Whitlock')).toHaveCount(0);
	const pdf = await anyone.request.get(`${link}/record.pdf`);
	expect(pdf.status()).toBe(404);
	await anyone.close();
});

test('the demo client reaches her own project only: a crawl finds no other client', async ({
	page
}) => {
	// forty pages, each waited on until the network is idle: more than the default minute on a busy
	// two-core machine (the crawl of every role in crawl.spec.ts allows the same)
	test.setTimeout(180_000);
	await signIn(page, CLIENT);
	const seen = new Set<string>();
	const queue = ['/projects'];
	while (queue.length && seen.size < 40) {
		const path = queue.shift()!;
		if (seen.has(path)) continue;
		seen.add(path);
		const res = await page.goto(path);
		expect(res?.status(), path).toBeLessThan(400);
		await page.waitForLoadState('networkidle');
		const text = await page.locator('body').innerText();
		for (const name of OTHER_CLIENTS) expect(text, `${name} on ${path}`).not.toContain(name);
		const hrefs = await page
			.locator('a[href^="/"]')
			.evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).getAttribute('href')!));
		for (const href of hrefs) {
			const clean = href.split('#')[0];
			if (!clean || clean.startsWith('/api/') || clean.startsWith('/dev')) continue;
			if (!seen.has(clean)) queue.push(clean);
		}
	}
	expect([...seen].some((p) => p.endsWith('/record'))).toBe(true);
	// and the API answers the same: another client's project is not found
	const list = await page.request.get('/api/v1/workshops');
	expect(JSON.stringify(await list.json())).not.toContain('Quillfeather');
});

for (const [name, size] of [
	['phone', { width: 375, height: 800 }],
	['desktop', { width: 1280, height: 900 }]
] as const)
	test(`the printed record has no navigation or form controls (${name})`, async ({ page }) => {
		await page.setViewportSize(size);
		await signIn(page, CLIENT);
		await page.goto(`${await projectNamed(page, 'Whitlock library wall')}/record`);
		await expect(page.getByTestId('record-verdict').first()).toBeVisible();
		await page.emulateMedia({ media: 'print' });
		for (const selector of [
			'nav',
			'header:not(.record-head)',
			'footer',
			'button',
			'input',
			'select',
			'textarea',
			'form'
		])
			for (const el of await page.locator(selector).all())
				await expect(el, `${selector} in print`).toBeHidden();
		await expect(page.getByTestId('record-verdict').first()).toBeVisible();
		const dir = mkdtempSync(join(tmpdir(), 'spanwright-print-'));
		const file = join(dir, `record-${name}.pdf`);
		writeFileSync(file, await page.pdf({ format: name === 'phone' ? 'A4' : 'Letter' }));
		const text = pdfText(file);
		expect(text).toContain('Left bookcase, middle shelf');
		expect(text).toContain('This shelf sags about');
		for (const word of ['Sign out', 'Download the PDF', 'Send the record', 'Make a link'])
			expect(text).not.toContain(word);
		expect(readFileSync(file).subarray(0, 5).toString()).toBe('%PDF-');
	});
