// Every form action, posted a body that is not a readable form, answers 4xx with a message: never
// a 500. The actions are found by globbing the routes, so a new action is covered when it lands.
import { describe, expect, it } from 'vitest';
import { isActionFailure, isHttpError, isRedirect } from '@sveltejs/kit';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { cookieJar } from './support/request';
import { saveShelf } from './support/analyses';
import { createProject } from '../../src/lib/server/projects';
import { createInvitation } from '../../src/lib/server/workshops';

useTempDb();

type Action = (event: unknown) => unknown;
const modules = import.meta.glob<{ actions?: Record<string, Action> }>(
	'../../src/routes/**/+page.server.ts',
	{ eager: true }
);

/** Actions that never read a body (a button that is its own confirmation, or sign-out). */
const BODYLESS = new Set([
	'/signout default',
	'/invite/[token] accept',
	'/invite/project/[token] accept'
]);

const BAD_BODIES = [
	{ type: 'text/plain', body: 'name=Pantry', expect: 415 },
	{ type: 'application/json', body: '{"name":"Pantry"}', expect: 415 },
	{ type: 'multipart/form-data', body: 'name=Pantry', expect: 400 },
	{ type: 'multipart/form-data; boundary=x', body: '--x\r\nbroken', expect: 400 }
];

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Pantry',
		client: '',
		siteNotes: ''
	});
	const analysis = await saveShelf(cast.owner, project.id);
	const { token } = await createInvitation(
		cast.owner,
		cast.workshopId,
		'new@example.test',
		'viewer'
	);
	return { actor: cast.owner, params: { id: project.id, analysisId: analysis.id, token } };
}

async function post(action: Action, route: string, type: string, body: string) {
	const { actor, params } = await setup();
	const url = new URL(`http://localhost:5173${route.replace(/\(\w+\)\//g, '')}`);
	const request = new Request(url, {
		method: 'POST',
		headers: { origin: url.origin, 'content-type': type },
		body
	});
	const event = {
		url,
		request,
		params,
		route: { id: route },
		locals: { actor, auth: async () => null },
		cookies: cookieJar(),
		getClientAddress: () => '127.0.0.1',
		fetch,
		setHeaders: () => {}
	};
	try {
		const out = await action(event);
		return { status: isActionFailure(out) ? out.status : 200, message: '' };
	} catch (e) {
		if (isHttpError(e)) return { status: e.status, message: e.body.message };
		if (isRedirect(e)) return { status: e.status, message: '' };
		return { status: 500, message: String(e) };
	}
}

const cases = Object.entries(modules).flatMap(([file, mod]) => {
	const route = file.replace('../../src/routes', '').replace('/+page.server.ts', '') || '/';
	return Object.entries(mod.actions ?? {}).map(([name, action]) => ({ route, name, action }));
});

describe('form actions refuse a body that is not a form', () => {
	it('finds the actions', () => {
		expect(cases.length).toBeGreaterThanOrEqual(25);
	});

	for (const { route, name, action } of cases)
		for (const bad of BAD_BODIES)
			it(`${route} ?/${name} with ${bad.type}`, async () => {
				const answer = await post(action, route, bad.type, bad.body);
				expect(answer.status, answer.message).toBeLessThan(500);
				if (BODYLESS.has(`${route} ${name}`)) return;
				expect(answer.status, answer.message).toBe(bad.expect);
				expect(answer.message).toMatch(/form/);
			});
});
