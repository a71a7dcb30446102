import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import sharp from 'sharp';
import { signIn } from './support/auth';

// Project documents: a builder adds two site photos and the designer's PDF drawing to the demo
// client's project, watches them go up, opens one, deletes it and brings it back; the client sees
// the pictures and is offered no changes.

const EDITOR = 'tomas@quillfeather.test';
const CLIENT = 'dana@whitlock-home.test';
const PROJECT = 'Whitlock library wall';

const photo = async (colour: string) =>
	sharp({ create: { width: 320, height: 240, channels: 3, background: colour } })
		.jpeg()
		.toBuffer();
const drawing = Buffer.from(
	'%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);

async function openProject(page: Page) {
	await page.goto('/projects');
	await page.getByRole('link', { name: PROJECT }).first().click();
	await expect(page.getByRole('heading', { level: 1, name: PROJECT })).toBeVisible();
}

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

test('a builder adds photos and a drawing, opens one, deletes and undoes; the client reads them', async ({
	page,
	browser
}) => {
	await signIn(page, EDITOR);
	await openProject(page);
	const panel = page.locator('section', {
		has: page.getByRole('heading', { name: 'Drawings and photos' })
	});

	// hold each upload's answer a moment so the progress can be seen
	await page.route('**/api/v1/projects/*/documents', async (route) => {
		await new Promise((r) => setTimeout(r, 600));
		await route.continue();
	});
	await panel.getByLabel('Choose files').setInputFiles([
		{ name: 'north-wall.jpg', mimeType: 'image/jpeg', buffer: await photo('#8b5a2b') },
		{ name: 'outlet.jpg', mimeType: 'image/jpeg', buffer: await photo('#556b2f') },
		{ name: 'elevation.pdf', mimeType: 'application/pdf', buffer: drawing }
	]);
	await panel.getByLabel('Caption for north-wall.jpg').fill('North wall, studs at 16 in');
	await panel.getByRole('button', { name: 'Add 3 files' }).click();
	await expect(panel.getByRole('progressbar', { name: 'Sending north-wall.jpg' })).toBeVisible();
	await page.screenshot({ path: 'test-results/documents-sending.png', fullPage: true });

	// the three arrive as tiles: two thumbnails and the drawing's icon
	await expect(panel.getByRole('link', { name: 'Open North wall, studs at 16 in' })).toBeVisible();
	await expect(panel.getByRole('link', { name: 'Open elevation.pdf' })).toBeVisible();
	await expect(panel.locator('img[src*="variant=thumbnail"]')).toHaveCount(2);
	await expect(panel.getByRole('list', { name: 'Files to add' })).toHaveCount(0);
	expect(await seriousViolations(page)).toEqual([]);

	// open one full size
	await panel.getByRole('link', { name: 'Open North wall, studs at 16 in' }).click();
	await expect(
		page.getByRole('heading', { level: 1, name: 'North wall, studs at 16 in' })
	).toBeVisible();
	const full = page.getByRole('img', { name: 'North wall, studs at 16 in' });
	await expect(full).toBeVisible();
	expect(await full.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(320);
	await page.getByLabel('Show it in the client’s record').check();
	await page.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByRole('status')).toHaveText('Saved.');

	// delete, then undo
	await page.getByRole('button', { name: 'Delete this file' }).click();
	await expect(page.getByText('The document was deleted.')).toBeVisible();
	await expect(page.getByRole('heading', { name: '2 documents' })).toBeVisible();
	await page.getByRole('button', { name: 'Undo' }).click();
	await expect(page.getByRole('heading', { name: '3 documents' })).toBeVisible();
	await expect(page.getByText('in the record')).toBeVisible();

	// the client reads them, with nothing to change
	const client = await (await browser.newContext()).newPage();
	await signIn(client, CLIENT);
	await openProject(client);
	await expect(client.getByRole('link', { name: 'Open North wall, studs at 16 in' })).toBeVisible();
	await expect(client.getByLabel('Choose files')).toHaveCount(0);
	await client.getByRole('link', { name: 'Open North wall, studs at 16 in' }).click();
	await expect(client.getByRole('button', { name: 'Delete this file' })).toHaveCount(0);
	await client.setViewportSize({ width: 375, height: 800 });
	await client.screenshot({ path: 'test-results/documents-client-phone.png', fullPage: true });
	expect(await seriousViolations(client)).toEqual([]);
});

test('a file whose bytes are not an image is refused by name, and nothing is added', async ({
	page
}) => {
	await signIn(page, EDITOR);
	await openProject(page);
	const panel = page.locator('section', {
		has: page.getByRole('heading', { name: 'Drawings and photos' })
	});
	await panel.getByLabel('Choose files').setInputFiles([
		{
			name: 'plan.jpg',
			mimeType: 'image/jpeg',
			buffer: Buffer.from('<svg><script>1</script></svg>')
		}
	]);
	await panel.getByRole('button', { name: 'Add to the project' }).click();
	await expect(panel.getByText(/Only JPEG, PNG and WebP images and PDF drawings/)).toBeVisible();
	await expect(panel.getByRole('link', { name: 'Open plan.jpg' })).toHaveCount(0);
});
