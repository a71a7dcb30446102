import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import Papa from 'papaparse';
import { signIn } from './support/auth';

// The wall journey (issue 10): a builder opens a new wall of cases (two tall bookcases and two low
// units with two drawers each), sees every shelf's verdict, the drawers and the tip-over checks,
// fixes the worst by a suggestion, downloads the cut list and the sheet layouts as CSV, sees the
// sheets to buy and the banding, and saves the wall in the project.

const EDITOR = 'tomas@quillfeather.test';
const elevation = (page: Page) =>
	page.locator('figure', {
		has: page.locator('svg title', { hasText: 'The wall seen from the front' })
	});
const worst = (page: Page) => page.locator('section[aria-labelledby="wall-worst-h"]');

async function openNewWall(page: Page) {
	await signIn(page, EDITOR);
	await page.goto('/projects');
	await page.locator('main a[href^="/projects/"]').first().click();
	await page.getByRole('link', { name: 'Plan a wall of cases' }).click();
	await expect(page).toHaveURL(/\/wall\/new$/);
}

test('describe the four-unit wall, fix the worst, download the cut list and sheets, save', async ({
	page
}) => {
	await page.setViewportSize({ width: 1400, height: 900 });
	await openNewWall(page);

	// every shelf's margin in words on the drawing; drawers and tip-over in the worst-first list
	await expect(elevation(page)).toContainText(/passes, \d+% to spare/);
	await expect(elevation(page).locator('desc')).toContainText(
		'low unit, left: 30" wide, 30" high, 0 shelves checked, 2 drawers'
	);
	await expect(worst(page)).toContainText(
		'tipping: load on drawer 1 pulled out against the 60 lb ASTM F2057-23 test weight'
	);
	await expect(worst(page)).toContainText('8 checks across the wall fail');
	await expect(page.getByText('The other 44 checks')).toBeVisible();
	await page.screenshot({ path: '/tmp/wall-e2e-desktop.png', fullPage: false });

	// the worst first: the left bookcase must be fixed to the wall; its suggestion clears it
	await expect(worst(page).locator('li').first()).toContainText('tall bookcase, left: anchoring');
	await worst(page)
		.getByRole('button', { name: 'tall bookcase, left: Fix the case to the wall' })
		.click();
	await expect(worst(page)).toContainText('7 checks across the wall fail');
	await expect(worst(page).locator('li').first()).not.toContainText('tall bookcase, left');
	await expect(
		page.getByRole('group', { name: 'tall bookcase, left' }).getByLabel('Fixed to the wall')
	).toHaveValue('bracket');
	// tip-over in plain words: the low units tip with both drawers out; fixing one to the wall says so
	const tipping = page.getByTestId('wall-tipping');
	await expect(tipping).toContainText(
		'low unit, left: tips over by itself with all its drawers pulled out, even empty. Fix it to the wall'
	);
	await worst(page)
		.getByRole('button', { name: 'low unit, left: Fix the case to the wall' })
		.click();
	await expect(tipping).toContainText(
		'low unit, left: would tip over by itself with all its drawers pulled out; it is fixed to the wall'
	);
	await expect(worst(page)).toContainText('4 checks across the wall fail');

	// a drawer slide's side room is the builder's to set: an unreadable text is marked beside it
	// and kept as typed
	const lowRight = page.getByRole('group', { name: 'low unit, right' });
	await lowRight.getByText('Slides, boxes and fronts').click();
	const room = lowRight.getByLabel('Room each side');
	const roomField = room.locator('xpath=ancestor::div[contains(@class,"field")][1]');
	await room.fill('half an inch');
	await expect(roomField).toContainText('Expected a length');
	await expect(room).toHaveValue('half an inch');
	await room.fill('1/2');
	await expect(roomField).not.toContainText('Expected a length');

	// the anchor strip joins the cut list
	await expect(page.locator('section[aria-labelledby="cutlist-h"]')).toContainText('anchor strip');

	// sheets to buy and banding shown
	await expect(page.getByTestId('sheets-to-buy')).toContainText(/\d+ × MDO/);
	await expect(page.getByTestId('banding')).toContainText(/\d+ ft to match MDO/);

	// the cut list as CSV: fractions as the user writes them, inch marks quoted
	const [cut] = await Promise.all([
		page.waitForEvent('download'),
		page.getByRole('button', { name: 'Download the cut list (CSV)' }).click()
	]);
	expect(cut.suggestedFilename()).toBe('wall-of-cases-cut-list.csv');
	const rows = Papa.parse<string[]>(await readFile((await cut.path())!, 'utf8')).data;
	expect(rows[0].slice(0, 3)).toEqual(['Mark', 'Count', 'Part']);
	const side = rows.find((r) => r[2] === 'side')!;
	// the two tall end sides (their outer faces show): 80" less the 3 1/2" plinth; 1/8" more rough
	expect(side.slice(0, 2)).toEqual(['A', '2']);
	expect(side[5]).toBe('76 1/2"');
	expect(side[7]).toBe('76 5/8"');

	const [sheets] = await Promise.all([
		page.waitForEvent('download'),
		page.getByRole('button', { name: 'Download the sheet layouts (CSV)' }).click()
	]);
	const cuts = Papa.parse<string[]>(await readFile((await sheets.path())!, 'utf8')).data;
	expect(cuts[0]).toEqual(['Material', 'Sheet', 'Cut', 'What', 'Part', 'Leaves']);
	expect(cuts.some((r) => r[3] === 'rip strip 1 off the sheet')).toBe(true);
	await expect(page.locator('figure.sheet-page').first()).toContainText('sheet 1 of');

	await page.locator('#analysis-name').fill('Living-room wall');
	await page.getByRole('button', { name: 'Save in the project' }).click();
	await expect(page).toHaveURL(/\/wall\/[0-9a-f-]{36}$/);
	await page.reload();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Living-room wall');
	await expect(worst(page)).toContainText('4 checks across the wall fail');
});

test('the wall screen at 375 px: the drawing scrolls sideways, nothing serious for axe', async ({
	page
}) => {
	await page.setViewportSize({ width: 375, height: 800 });
	await openNewWall(page);
	await expect(elevation(page)).toContainText(/passes/);
	await page.screenshot({ path: '/tmp/wall-e2e-phone.png', fullPage: false });
	const { violations } = await new AxeBuilder({ page }).analyze();
	expect(
		violations
			.filter((v) => v.impact === 'serious' || v.impact === 'critical')
			.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)
	).toEqual([]);
});
