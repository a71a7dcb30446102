import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/auth';

// Plan a joint and Check tipping, each a screen of its own: a builder starts one from the project
// page, sees the drawing and the verdict in sentences with the cautions, saves, reloads and finds
// the same values stored, changes it and reads the versions in the history; the demo's saved joint
// plan opens in its screen (it used to be a 404); axe at phone and desktop widths.

const EDITOR = 'tomas@quillfeather.test';
// 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
const INCH_M = 0.0254;
// 1 lbf = 4.4482216152605 N exactly (1 lb × standard gravity; NIST SP 811 B.8)
const LBF_N = 4.4482216152605;

async function firstProject(page: Page) {
	await page.goto('/projects');
	const href = await page.locator('main a[href^="/projects/"]').first().getAttribute('href');
	expect(href).toBeTruthy();
	return href!;
}

async function seriousViolations(page: Page) {
	const { violations } = await new AxeBuilder({ page }).analyze();
	return violations
		.filter((v) => v.impact === 'serious' || v.impact === 'critical')
		.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

test('a builder plans a joint, saves it, reloads it and reads its history', async ({ page }) => {
	await signIn(page, EDITOR);
	const project = await firstProject(page);
	await page.goto(project);
	await page.getByRole('link', { name: 'Plan a joint' }).click();
	await expect(page).toHaveURL(/\/joint\/new$/);

	const answer = page.getByTestId('joint-answer');
	await expect(answer).toContainText('✓ Holds.');
	await expect(answer).toContainText(/^✓ Holds\. \d+ pocket screws, each #8/);
	await expect(
		page.getByRole('img', { name: /edge of the shelf with its fasteners/ })
	).toBeVisible();
	await expect(page.getByTestId('cautions')).toContainText('defer to local codes');

	// a load far beyond the screws: the verdict says so, and the cautions stay
	await page.getByLabel('Load on the joint', { exact: true }).fill('900');
	await expect(page.getByLabel('Load on the joint, read as')).toHaveText('= 900 lbf');
	await page.getByLabel('Number of fasteners (leave empty to plan it)').fill('2');
	await expect(answer).toContainText('✗ Overloaded.');
	await expect(page.getByTestId('cautions')).toBeVisible();

	// an unreadable length: the result is replaced, the field is named at the top with a link
	await page.getByLabel('Length of the joint', { exact: true }).fill('0');
	await expect(page.getByTestId('stale-result')).toBeVisible();
	await expect(answer).toHaveCount(0);
	await page
		.getByTestId('error-summary')
		.getByRole('link', { name: 'Length of the joint' })
		.click();
	await expect(page.getByLabel('Length of the joint', { exact: true })).toBeFocused();
	await page.getByLabel('Length of the joint', { exact: true }).fill('11 1/4');
	await page.getByLabel('Number of fasteners (leave empty to plan it)').fill('');
	await page.getByLabel('Load on the joint', { exact: true }).fill('60');

	await page.locator('#analysis-name').fill('Fixed shelf into the left side');
	await page.getByRole('button', { name: 'Save in the project' }).click();
	await expect(page).toHaveURL(/\/joint\/[0-9a-f-]{36}$/);
	const id = page.url().split('/').pop()!;

	await page.reload();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(
		'Fixed shelf into the left side'
	);
	await expect(page.getByLabel('Length of the joint', { exact: true })).toHaveValue('11 1/4"');
	await expect(page.getByLabel('Shelf: thickness (actual)', { exact: true })).toHaveValue('23/32"');
	await expect(page.getByLabel('Load on the joint', { exact: true })).toHaveValue('60 lbf');
	await expect(answer).toContainText('✓ Holds.');

	// what was stored: the input in SI units and the server's own result
	const stored = await (await page.request.get(`/api/v1/analyses/${id}`)).json();
	expect(stored.kind).toBe('joint');
	expect(stored.input.length).toBeCloseTo(11.25 * INCH_M, 12);
	expect(stored.input.endPiece.thickness).toBeCloseTo((23 / 32) * INCH_M, 12);
	expect(stored.input.demand.shear).toBeCloseTo(60 * LBF_N, 9);
	expect(stored.pass).toBe(true);

	// a change is a new version, and the history lists both
	await page.getByLabel('Load on the joint', { exact: true }).fill('80');
	await page.getByRole('button', { name: 'Save changes' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
	await page.getByRole('link', { name: 'History' }).click();
	await expect(page.getByRole('link', { name: /^Version 2 \(current\)/ })).toBeVisible();
	await expect(page.getByRole('link', { name: /^Version 1$/ })).toBeVisible();
	await expect(page.getByText('Joint plan “Fixed shelf into the left side”')).toBeVisible();
});

test('a builder checks a bookcase for tipping, saves, reloads and reads its history', async ({
	page
}) => {
	await signIn(page, EDITOR);
	const project = await firstProject(page);
	await page.goto(project);
	await page.getByRole('link', { name: 'Check tipping' }).click();
	await expect(page).toHaveURL(/\/tipping\/new$/);

	const answer = page.getByTestId('tipping-answer');
	// a 72" bookcase standing free must be anchored
	await expect(answer).toContainText('✗ Can tip over.');
	await expect(page.getByText(/It must be fixed to the wall/)).toBeVisible();
	await expect(page.getByRole('img', { name: /case from the side/ })).toBeVisible();
	const cautions = page.getByTestId('cautions');
	await expect(cautions).toContainText(
		'Anchor every tall case to the wall whatever this number says'
	);

	// anchored into studs with a bracket, it holds; the cautions still say to anchor it
	await page.getByLabel('Fixed to the wall').selectOption('bracket');
	await expect(answer).toContainText('✓ Stays up as checked.');
	await expect(page.getByText(/Its restraint holds the/)).toBeVisible();
	await expect(cautions).toContainText('Anchor every tall case');

	// a case height below a shelf: the result is replaced and the field is named at the top
	await page.getByLabel('Overall height', { exact: true }).fill('30');
	await expect(page.getByTestId('stale-result')).toBeVisible();
	await expect(answer).toHaveCount(0);
	await expect(page.getByTestId('error-summary')).toBeVisible();
	await page.getByLabel('Overall height', { exact: true }).fill('72');
	await expect(answer).toContainText('✓ Stays up as checked.');

	await page.locator('#analysis-name').fill('Reading-nook bookcase');
	await page.getByRole('button', { name: 'Save in the project' }).click();
	await expect(page).toHaveURL(/\/tipping\/[0-9a-f-]{36}$/);
	const id = page.url().split('/').pop()!;

	await page.reload();
	await expect(page.getByLabel('Overall height', { exact: true })).toHaveValue('72"');
	await expect(page.getByLabel('Shelf 4: what it holds', { exact: true })).toHaveValue('60 lbf');
	await expect(page.getByLabel('Fixed to the wall')).toHaveValue('bracket');
	await expect(answer).toContainText('✓ Stays up as checked.');

	const stored = await (await page.request.get(`/api/v1/analyses/${id}`)).json();
	expect(stored.kind).toBe('stability');
	expect(stored.input.height).toBeCloseTo(72 * INCH_M, 12);
	expect(stored.input.contents).toHaveLength(4);
	expect(stored.input.anchoring.kind).toBe('bracket');

	await page.getByLabel('Fixed to the wall').selectOption('none');
	await page.getByRole('button', { name: 'Save changes' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
	await page.getByRole('link', { name: 'History' }).click();
	await expect(page.getByRole('link', { name: /^Version 2 \(current\)/ })).toBeVisible();
	await expect(page.getByText('Tipping check “Reading-nook bookcase”')).toBeVisible();
	await page.getByRole('link', { name: /^Version 1$/ }).click();
	await expect(page.locator('dd', { hasText: 'bracket' })).toBeVisible();
});

test("the demo's saved joint plan opens in the joint screen", async ({ page }) => {
	await signIn(page, EDITOR);
	await page.goto('/projects');
	await page
		.getByRole('link', { name: /library/i })
		.first()
		.click();
	await page.getByRole('link', { name: 'Fixed shelf to case side', exact: true }).click();
	await expect(page).toHaveURL(/\/joint\/[0-9a-f-]{36}$/);
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Fixed shelf to case side');
	await expect(page.getByTestId('joint-answer')).toBeVisible();
});

for (const [name, size] of [
	['phone', { width: 375, height: 800 }],
	['desktop', { width: 1280, height: 900 }]
] as const) {
	for (const screen of ['joint', 'tipping'] as const) {
		test(`the ${screen} screen has no serious accessibility problems (${name})`, async ({
			page
		}) => {
			await page.setViewportSize(size);
			await signIn(page, EDITOR);
			const project = await firstProject(page);
			await page.goto(`${project}/${screen}/new`);
			await expect(page.getByTestId(`${screen}-answer`)).toBeVisible();
			expect(await seriousViolations(page)).toEqual([]);
		});
	}
}
