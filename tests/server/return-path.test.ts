// Every redirect target taken from a request stays on this site (issue: `?next=/%09/evil.example`
// became `//evil.example` in the browser, and a CR or LF in `next` answered 500).
import { describe, expect, it } from 'vitest';
import { safeRedirectPath } from '../../src/lib/schemas/return-path';
import { load as signInLoad } from '../../src/routes/(public)/signin/+page.server';
import { load as signUpLoad } from '../../src/routes/(public)/signup/+page.server';
import { actions as workshopActions } from '../../src/routes/(app)/workshop/+page.server';
import { createWorkshopFor } from '../../src/lib/server/workshops';
import { makeUser } from './support/actors';
import { useTempDb } from './support/db';
import { formEvent, runAction } from './support/request';

useTempDb();

const offSite = [
	'//evil.example',
	'/\\evil.example',
	'/\t/evil.example',
	'/\n/evil.example',
	'/\r\n/evil.example',
	'\t//evil.example',
	' //evil.example',
	'/\u0000/evil.example',
	'https://evil.example/',
	'evil.example',
	'javascript:alert(1)',
	'/\\/evil.example',
	''
];

describe('safeRedirectPath', () => {
	it.each(offSite)('refuses %j', (target) => {
		expect(safeRedirectPath(target, '/projects')).toBe('/projects');
	});

	it('keeps a path on this site, with its query and fragment', () => {
		expect(safeRedirectPath('/projects/abc?tab=history#v3', '/')).toBe(
			'/projects/abc?tab=history#v3'
		);
		expect(safeRedirectPath('/account', '/')).toBe('/account');
	});

	it('answers the parsed path, so a CR or LF cannot reach a header', () => {
		const path = safeRedirectPath('/projects\r\nSet-Cookie: a=b', '/');
		expect(path).not.toMatch(/[\r\n]/);
		expect(path.startsWith('/projects')).toBe(true);
	});

	it('refuses null, undefined and very long targets', () => {
		expect(safeRedirectPath(null, '/x')).toBe('/x');
		expect(safeRedirectPath(undefined, '/x')).toBe('/x');
		expect(safeRedirectPath('/' + 'a'.repeat(3000), '/x')).toBe('/x');
	});
});

/** The redirect a load throws (a signed-in visitor is sent on to `next`). */
async function redirectOf(load: (e: never) => unknown, next: string) {
	const url = new URL('http://localhost:5173/signin');
	url.searchParams.set('next', next);
	const actor = await makeUser('back');
	try {
		await load({ url, locals: { actor }, cookies: { get: () => undefined } } as never);
	} catch (e) {
		return (e as { location?: string }).location;
	}
	return undefined;
}

describe('sign-in and sign-up send a signed-in visitor only to a path on this site', () => {
	for (const [name, load] of [
		['sign-in', signInLoad],
		['sign-up', signUpLoad]
	] as const) {
		it(`${name}: a tab after the slash is refused`, async () => {
			expect(await redirectOf(load as never, '/\t/evil.example')).toBe('/projects');
		});
		it(`${name}: CR and LF in next give a redirect, not a 500`, async () => {
			const location = await redirectOf(load as never, '/account\r\nX-Evil: 1');
			expect(location).toBeDefined();
			expect(location).not.toMatch(/[\r\n]/);
		});
		it(`${name}: a path on this site is kept`, async () => {
			expect(await redirectOf(load as never, '/account')).toBe('/account');
		});
	}
});

describe("the workshop switcher's next", () => {
	it('is checked: an off-site target goes to the projects instead', async () => {
		const actor = await makeUser('switcher');
		const ws = await createWorkshopFor(actor.id, 'Second shop');
		for (const next of ['//evil.example', '/\t/evil.example', 'https://evil.example']) {
			const event = formEvent({
				url: `/workshop?/switch&next=${encodeURIComponent(next)}`,
				fields: { workshopId: ws.id },
				actor
			});
			const { thrown } = await runAction(workshopActions.switch, event);
			expect(thrown?.status).toBe(303);
			expect(thrown?.location).toBe('/projects');
		}
	});

	it('keeps a path on this site', async () => {
		const actor = await makeUser('switcher');
		const ws = await createWorkshopFor(actor.id, 'Third shop');
		const event = formEvent({
			url: `/workshop?/switch&next=${encodeURIComponent('/projects?page=2')}`,
			fields: { workshopId: ws.id },
			actor
		});
		const { thrown } = await runAction(workshopActions.switch, event);
		expect(thrown?.location).toBe('/projects?page=2');
	});
});
