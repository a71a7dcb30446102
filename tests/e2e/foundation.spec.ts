import { expect, test } from '@playwright/test';
import { signIn, signOut } from './support/auth';
import { linkFromMail } from './support/mail';

// The foundation journey: a builder signs up, confirms by the e-mailed link, sets up a workshop
// and a project, invites a client as viewer; the client sees the project and every change is refused.
test('sign up, confirm by mail, share a project with a viewer who cannot change it', async ({
	page,
	browser
}) => {
	const stamp = Date.now();
	const builder = `maren.${stamp}@example.test`;
	const client = `client.${stamp}@example.test`;
	const password = 'long enough joinery words';

	// sign up
	const beforeSignUp = new Date();
	await page.goto('/signup');
	await page.getByLabel('Your name').fill('Maren Holt');
	await page.getByLabel('E-mail').fill(builder);
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: /create the account/i }).click();

	// follow the caught e-mail: it signs the builder in
	const { link } = await linkFromMail(builder, beforeSignUp);
	await page.goto(link);
	await expect(page).toHaveURL(/\/projects/);

	// a workshop of their own, then a project in it
	await page.goto('/workshop');
	await page.getByLabel('Name of the new workshop').fill('Holt Built-ins');
	await page.getByRole('button', { name: 'Create workshop' }).click();
	await expect(page.getByRole('heading', { level: 1, name: 'Holt Built-ins' })).toBeVisible();

	await page.goto('/projects');
	await expect(page.getByText('No projects yet.')).toBeVisible();
	await page.getByLabel('Name', { exact: true }).fill('Study bookcases');
	await page.getByLabel('Client', { exact: true }).fill('The Ferrands');
	await page.getByRole('button', { name: 'Create project' }).click();
	await expect(page.getByRole('heading', { level: 1, name: 'Study bookcases' })).toBeVisible();
	const projectUrl = page.url();

	// invite the client as a viewer
	await page.goto('/workshop');
	const sentAt = new Date();
	await page.getByLabel('E-mail').fill(client);
	await page.getByLabel('Role', { exact: true }).selectOption('viewer');
	await page.getByRole('button', { name: 'Send invitation' }).click();
	await expect(page.getByText(`Invitation sent to ${client}.`)).toBeVisible();
	const invitation = await linkFromMail(client, sentAt, /invites you/);
	await signOut(page);

	// the client creates an account from the invitation and accepts it
	const viewer = await browser.newPage();
	await viewer.goto(invitation.link);
	await viewer.getByRole('link', { name: 'Create an account' }).click();
	const viewerSignUp = new Date();
	await viewer.getByLabel('Your name').fill('Odile Ferrand');
	await viewer.getByLabel('E-mail').fill(client);
	await viewer.getByLabel('Password').fill('another long password');
	await viewer.getByRole('button', { name: /create the account/i }).click();
	const confirm = await linkFromMail(client, viewerSignUp, /./);
	await viewer.goto(confirm.link);
	await viewer.goto(invitation.link);
	await viewer.getByRole('button', { name: /accept/i }).click();
	await expect(viewer).toHaveURL(/\/projects/);

	// the viewer sees the project, and is offered no change
	await expect(viewer.getByRole('link', { name: 'Study bookcases' })).toBeVisible();
	await expect(viewer.getByRole('button', { name: 'Create project' })).toHaveCount(0);
	await viewer.goto(projectUrl);
	await expect(viewer.getByText('The Ferrands').first()).toBeVisible();
	await expect(viewer.getByRole('button', { name: /save details|delete project/i })).toHaveCount(0);
	await expect(viewer.getByText('You can read this project; editors change it.')).toBeVisible();

	// …and a change sent directly is refused by the server, through the API and through the form
	const projectId = projectUrl.split('/').pop()!;
	const apiPatch = await viewer.request.patch(`/api/v1/projects/${projectId}`, {
		data: { name: 'Taken over' }
	});
	expect(apiPatch.status()).toBe(403);
	expect((await apiPatch.json()).error).toMatch(/editor/);
	const formPost = await viewer.request.post(`${projectUrl}?/update`, {
		form: { name: 'Taken over', client: '', siteNotes: '' },
		headers: { origin: new URL(projectUrl).origin, 'x-sveltekit-action': 'true' }
	});
	const formResult = await formPost.json();
	expect(formPost.status()).toBe(403);
	expect(formResult).toMatchObject({ type: 'error', error: { message: /editor role/ } });
	await viewer.reload();
	await expect(viewer.getByRole('heading', { level: 1, name: 'Study bookcases' })).toBeVisible();

	await signOut(viewer);
	await viewer.goto('/projects');
	await expect(viewer).toHaveURL(/\/signin/);
});

test('a demo editor signs in with a password and finds the shop’s projects', async ({ page }) => {
	await signIn(page, 'tomas@quillfeather.test');
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toBeVisible();
	await page.getByLabel('Search by name, client or notes').fill('pantry');
	await expect(page.getByRole('link', { name: 'Kiln Lane pantry' })).toBeVisible();
	await expect(page.getByRole('link', { name: 'Whitlock library wall' })).toHaveCount(0);
});
