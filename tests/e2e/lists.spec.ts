import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { linkFromMail } from './support/mail';

// The projects and analyses lists keep their state in the address: they work with JavaScript off
// (search, sort, page, open, row actions with a confirmed delete), and a copied address shows the
// same rows. With JavaScript on, the row menu and the delete dialog do the same through the page.

/** A fresh builder with a workshop of their own (so no other journey's rows are in the lists). */
async function freshBuilder(page: Page, label: string) {
	const email = `${label}.${Date.now()}@example.test`;
	const since = new Date();
	await page.goto('/signup');
	await page.getByLabel('Your name').fill('Pia Lund');
	await page.getByLabel('E-mail').fill(email);
	await page.getByLabel('Password').fill('long enough joinery words');
	await page.getByRole('button', { name: /create the account/i }).click();
	const { link } = await linkFromMail(email, since);
	await page.goto(link);
	await expect(page).toHaveURL(/\/projects/);
	const ws = await page.request.post('/api/v1/workshops', { data: { name: 'Lund Joinery' } });
	expect(ws.status()).toBe(201);
	return (await ws.json()).id as string;
}

/** A shelf worked by hand (1 m span, 100 N at mid-span; the test support's hand-worked shelf). */
const shelf = {
	span: 1,
	depth: 0.25,
	thickness: 0.02,
	material: { name: 'Test board', modulus: 10e9, rupture: 40e6, density: 600 },
	support: 'simple',
	loads: [{ kind: 'point', force: 100, at: 0.5 }],
	selfWeight: false,
	duration: 'short',
	limit: 'L/144',
	options: { shearDeflection: false, safetyFactor: 3, curvePoints: 101 }
};

async function post(request: APIRequestContext, url: string, data: unknown) {
	const res = await request.post(url, { data });
	expect(res.status(), await res.text()).toBe(201);
	return res.json();
}

const rowNames = (page: Page) =>
	page.locator('tbody tr td:first-child a:first-child').allTextContents();

test.describe('without JavaScript', () => {
	test.use({ javaScriptEnabled: false });

	test('projects: search, sort, page, bookmark and open', async ({ page, browser }) => {
		const workshopId = await freshBuilder(page, 'lists');
		for (let i = 1; i <= 12; i++)
			await post(page.request, '/api/v1/projects', { workshopId, name: `Bay ${i}`, client: '' });

		await page.goto('/projects');
		await expect(page.getByText('Loading')).toHaveCount(0);
		await expect(page.locator('tbody tr')).toHaveCount(10);
		await expect(page.getByText('Page 1 of 2')).toBeVisible();

		// search: Enter or the button sends the form; the address keeps it
		await page.getByLabel('Search by name, client or notes').fill('Bay 1');
		await page.getByRole('button', { name: 'Search' }).click();
		await expect(page).toHaveURL(/[?&]q=Bay\+1/);
		expect((await rowNames(page)).sort()).toEqual(['Bay 1', 'Bay 10', 'Bay 11', 'Bay 12']);

		// sort by name, then the other way; the search is kept
		await page.getByRole('link', { name: 'Project', exact: true }).click();
		await expect(page).toHaveURL(/sort=name&dir=asc/);
		expect(await rowNames(page)).toEqual(['Bay 1', 'Bay 10', 'Bay 11', 'Bay 12']);
		await expect(page.getByRole('columnheader', { name: 'Project' })).toHaveAttribute(
			'aria-sort',
			'ascending'
		);
		await page.getByRole('link', { name: 'Project', exact: true }).click();
		expect(await rowNames(page)).toEqual(['Bay 12', 'Bay 11', 'Bay 10', 'Bay 1']);

		// page through every project in name order
		await page.goto('/projects?sort=name&dir=asc');
		await page.getByRole('link', { name: 'Next' }).click();
		await expect(page).toHaveURL(/page=2/);
		expect(await rowNames(page)).toEqual(['Bay 8', 'Bay 9']);
		await expect(page.getByText('Page 2 of 2')).toBeVisible();

		// the address is a bookmark: another window opened on it shows the same rows
		const again = await browser.newPage({
			javaScriptEnabled: false,
			storageState: await page.context().storageState()
		});
		await again.goto(page.url());
		expect(await rowNames(again)).toEqual(['Bay 8', 'Bay 9']);
		await again.close();

		await page.getByRole('link', { name: 'Bay 9', exact: true }).click();
		await expect(page.getByRole('heading', { level: 1, name: 'Bay 9' })).toBeVisible();
	});

	test('analyses: search, filter, sort, page, open, and a delete that asks first', async ({
		page
	}) => {
		const workshopId = await freshBuilder(page, 'analyses');
		const project = await post(page.request, '/api/v1/projects', {
			workshopId,
			name: 'Long wall',
			client: ''
		});
		for (let i = 1; i <= 11; i++)
			await post(page.request, `/api/v1/projects/${project.id}/analyses`, {
				kind: 'shelf',
				name: `Shelf ${String(i).padStart(2, '0')}`,
				input: shelf
			});

		await page.goto(`/projects/${project.id}`);
		await expect(page.locator('tbody tr')).toHaveCount(10);
		await page.getByRole('link', { name: 'Analysis', exact: true }).click();
		await expect(page).toHaveURL(/sort=name&dir=asc/);
		await page.getByRole('link', { name: 'Next' }).click();
		expect(await rowNames(page)).toEqual(['Shelf 11']);

		await page.goto(`/projects/${project.id}?sort=name&dir=desc`);
		await page.getByLabel('Search by name or result').fill('Shelf 0');
		await page.getByLabel('Kind').selectOption('shelf');
		await page.getByLabel('Verdict').selectOption('pass');
		await page.getByRole('button', { name: 'Search' }).click();
		await expect(page).toHaveURL(/q=Shelf\+0.*kind=shelf.*pass=pass/);
		const found = await rowNames(page);
		expect(found.slice(0, 3)).toEqual(['Shelf 09', 'Shelf 08', 'Shelf 07']);
		expect(found).toHaveLength(9);

		// the row's actions open as plain forms; a delete asks again before it deletes
		await page.getByRole('link', { name: 'Actions for Shelf 09' }).click();
		await page.getByRole('button', { name: 'Delete…' }).click();
		await expect(page.getByRole('heading', { name: 'Delete “Shelf 09”?' })).toBeVisible();
		expect(await rowNames(page)).toContain('Shelf 09');
		await page.getByRole('button', { name: 'Delete', exact: true }).click();
		await expect(page.getByText('Deleted “Shelf 09”.')).toBeVisible();
		expect(await rowNames(page)).not.toContain('Shelf 09');
		// the list is where it was: same search, filters and order
		expect((await rowNames(page))[0]).toBe('Shelf 08');
		await page.getByRole('button', { name: /Undo/ }).click();
		await expect(page.getByText('Brought back “Shelf 09”.')).toBeVisible();
		expect((await rowNames(page))[0]).toBe('Shelf 09');

		await page.getByRole('link', { name: 'Shelf 09', exact: true }).click();
		await expect(page).toHaveURL(/\/shelf\//);
	});
});

test('with JavaScript: the row menu is not clipped, and the delete dialog asks first', async ({
	page
}) => {
	const workshopId = await freshBuilder(page, 'menu');
	const project = await post(page.request, '/api/v1/projects', {
		workshopId,
		name: 'Alcove',
		client: ''
	});
	const other = await post(page.request, '/api/v1/projects', {
		workshopId,
		name: 'Hallway',
		client: ''
	});
	await post(page.request, `/api/v1/projects/${project.id}/analyses`, {
		kind: 'shelf',
		name: 'Only shelf',
		input: shelf
	});
	await page.goto(`/projects/${project.id}`);
	await page.waitForLoadState('networkidle'); // the menu opens once the page has started
	// one row: the menu still shows every item, drawn outside the table's scroll area
	await page.getByRole('link', { name: 'Actions for Only shelf' }).click();
	await expect(page).toHaveURL(new RegExp(`/projects/${project.id}$`));
	await expect(page.getByRole('menuitem', { name: 'Duplicate' })).toBeVisible();
	await expect(page.getByRole('menuitem', { name: 'Delete…' })).toBeVisible();
	await page.getByRole('menuitem', { name: 'Duplicate' }).click();
	await expect(page.getByText('Copied as “Only shelf (copy)”.')).toBeVisible();
	await expect(page.locator('tbody tr')).toHaveCount(2);

	await page.getByRole('link', { name: 'Actions for Only shelf (copy)' }).click();
	await page.getByRole('menuitem', { name: 'Delete…' }).click();
	const dialog = page.getByRole('alertdialog', { name: 'Delete this analysis?' });
	await expect(dialog).toBeVisible();
	await dialog.getByRole('button', { name: 'Keep it' }).click();
	await expect(dialog).toHaveCount(0);
	await expect(page.locator('tbody tr')).toHaveCount(2);

	await page.getByRole('link', { name: 'Actions for Only shelf (copy)' }).click();
	await page.getByRole('menuitem', { name: 'Delete…' }).click();
	await dialog.getByRole('button', { name: 'Delete' }).click();
	await expect(page.getByText('Deleted “Only shelf (copy)”.')).toBeVisible();
	await expect(page.locator('tbody tr')).toHaveCount(1);

	// move through the submenu
	await page.getByRole('link', { name: 'Actions for Only shelf' }).click();
	await page.getByRole('menuitem', { name: 'Move to…' }).click();
	await page.getByRole('menuitem', { name: 'Hallway' }).click();
	await expect(page.getByText('Moved “Only shelf” to Hallway.')).toBeVisible();
	await page.goto(`/projects/${other.id}`);
	expect(await rowNames(page)).toEqual(['Only shelf']);

	// typing searches after a pause, and the address follows
	await page.getByLabel('Search by name or result').fill('nothing like it');
	await expect(page).toHaveURL(/q=nothing\+like\+it/);
	await expect(page.getByText('No analysis matches these filters.')).toBeVisible();
});
