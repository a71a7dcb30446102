// Every API route that touches stored data × who is asking, with the client's side: clients of
// this and of another project and share-link holders (the table of authorization.test.ts, widened).
// anonymous: no actor; viewer/editor/owner: members of the workshop; outsider: a member of another;
// client: invited to this project alone; otherClient: invited to another project of the same
// workshop; shareHolder: no account, holding a share link to this project's record.
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { event, grantProject, makeWorkshopWithCast } from './support/actors';
import * as workshopsApi from '../../src/routes/api/v1/workshops/+server';
import * as workshopApi from '../../src/routes/api/v1/workshops/[id]/+server';
import * as projectsApi from '../../src/routes/api/v1/projects/+server';
import * as projectApi from '../../src/routes/api/v1/projects/[id]/+server';
import { createProject } from '../../src/lib/server/projects';
import * as analysesApi from '../../src/routes/api/v1/projects/[id]/analyses/+server';
import * as analysisApi from '../../src/routes/api/v1/analyses/[id]/+server';
import * as undeleteApi from '../../src/routes/api/v1/analyses/[id]/undelete/+server';
import * as revisionsApi from '../../src/routes/api/v1/analyses/[id]/revisions/+server';
import * as revisionApi from '../../src/routes/api/v1/analyses/[id]/revisions/[version]/+server';
import * as duplicateApi from '../../src/routes/api/v1/analyses/[id]/duplicate/+server';
import * as moveApi from '../../src/routes/api/v1/analyses/[id]/move/+server';
import { deleteAnalysis, updateAnalysis } from '../../src/lib/server/analyses';
import { handShelf, saveShelf } from './support/analyses';
import type { Actor } from '../../src/lib/server/access';
import * as meApi from '../../src/routes/api/v1/me/+server';
import * as tokensApi from '../../src/routes/api/v1/tokens/+server';
import * as tokenApi from '../../src/routes/api/v1/tokens/[id]/+server';
import { createApiToken } from '../../src/lib/server/accounts/api-tokens';
import * as projectPdfApi from '../../src/routes/api/v1/projects/[id]/record.pdf/+server';
import * as analysisPdfApi from '../../src/routes/api/v1/analyses/[id]/record.pdf/+server';
import * as sharedPage from '../../src/routes/shared/[token]/+page.server';
import * as sharedPdf from '../../src/routes/shared/[token]/record.pdf/+server';
import { createShareLink, revokeShareLink } from '../../src/lib/server/share-links';
import { randomBytes } from 'node:crypto';

useTempDb();

type Who =
	| 'anonymous'
	| 'client'
	| 'otherClient'
	| 'viewer'
	| 'editor'
	| 'owner'
	| 'outsider'
	| 'shareHolder';
type Cast = Awaited<ReturnType<typeof makeWorkshopWithCast>>;
interface Row {
	route: string;
	call: (actor: Actor | null, cast: Cast, projectId: string) => Promise<Response> | Response;
	expect: Record<Who, number>;
}

const table: Row[] = [
	{
		route: 'GET /workshops',
		call: (a) => workshopsApi.GET(event({ actor: a })),
		expect: {
			anonymous: 401,
			client: 200,
			otherClient: 200,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 200,
			shareHolder: 401
		}
	},
	{
		route: 'POST /workshops',
		call: (a) =>
			workshopsApi.POST(event({ actor: a, method: 'POST', body: { name: 'Night class' } })),
		expect: {
			anonymous: 401,
			client: 201,
			otherClient: 201,
			viewer: 201,
			editor: 201,
			owner: 201,
			outsider: 201,
			shareHolder: 401
		}
	},
	{
		route: 'GET /workshops/{id}',
		call: (a, c) => workshopApi.GET(event({ actor: a, params: { id: c.workshopId } })),
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'PATCH /workshops/{id}',
		call: (a, c) =>
			workshopApi.PATCH(
				event({
					actor: a,
					method: 'PATCH',
					params: { id: c.workshopId },
					body: { name: 'Renamed shop' }
				})
			),
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 403,
			editor: 403,
			owner: 200,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'DELETE /workshops/{id}',
		call: (a, c) =>
			workshopApi.DELETE(event({ actor: a, method: 'DELETE', params: { id: c.workshopId } })),
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 403,
			editor: 403,
			owner: 204,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'GET /projects',
		call: (a, c) => projectsApi.GET(event({ actor: a, url: `/?workshop=${c.workshopId}` })),
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'POST /projects',
		call: (a, c) =>
			projectsApi.POST(
				event({ actor: a, method: 'POST', body: { workshopId: c.workshopId, name: 'Wall unit' } })
			),
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 403,
			editor: 201,
			owner: 201,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'GET /projects/{id}',
		call: (a, _c, id) => projectApi.GET(event({ actor: a, params: { id } })),
		expect: {
			anonymous: 401,
			client: 200,
			otherClient: 404,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'PATCH /projects/{id}',
		call: (a, _c, id) =>
			projectApi.PATCH(
				event({ actor: a, method: 'PATCH', params: { id }, body: { client: 'New client' } })
			),
		expect: {
			anonymous: 401,
			client: 403,
			otherClient: 404,
			viewer: 403,
			editor: 200,
			owner: 200,
			outsider: 404,
			shareHolder: 401
		}
	},
	{
		route: 'DELETE /projects/{id}',
		call: (a, _c, id) => projectApi.DELETE(event({ actor: a, method: 'DELETE', params: { id } })),
		expect: {
			anonymous: 401,
			client: 403,
			otherClient: 404,
			viewer: 403,
			editor: 204,
			owner: 204,
			outsider: 404,
			shareHolder: 401
		}
	}
];

// ---- saved analyses: each case saves one (as the owner) in the case's project ----
// a client reads their own project's analyses and changes nothing; a client of another project
// learns nothing (404); the API takes no share link, so its holder is anonymous there
const read = {
	anonymous: 401,
	client: 200,
	otherClient: 404,
	viewer: 200,
	editor: 200,
	owner: 200,
	outsider: 404,
	shareHolder: 401
};
const write = { ...read, client: 403, viewer: 403 };
const analysisOf = async (c: Cast, projectId: string) => (await saveShelf(c.owner, projectId)).id;

table.push(
	{
		route: 'GET /projects/{id}/analyses',
		call: (a, _c, id) => analysesApi.GET(event({ actor: a, params: { id } })),
		expect: read
	},
	{
		route: 'POST /projects/{id}/analyses',
		call: (a, _c, id) =>
			analysesApi.POST(
				event({
					actor: a,
					method: 'POST',
					params: { id },
					body: { kind: 'shelf', name: 'Bay shelf', input: handShelf }
				})
			),
		expect: { ...write, editor: 201, owner: 201 }
	},
	{
		route: 'GET /analyses/{id}',
		call: async (a, c, p) =>
			analysisApi.GET(event({ actor: a, params: { id: await analysisOf(c, p) } })),
		expect: read
	},
	{
		route: 'PATCH /analyses/{id}',
		call: async (a, c, p) =>
			analysisApi.PATCH(
				event({
					actor: a,
					method: 'PATCH',
					params: { id: await analysisOf(c, p) },
					body: { version: 1, name: 'Renamed' }
				})
			),
		expect: write
	},
	{
		route: 'PUT /analyses/{id}',
		call: async (a, c, p) =>
			analysisApi.PUT(
				event({
					actor: a,
					method: 'PUT',
					params: { id: await analysisOf(c, p) },
					body: { version: 1, name: 'Replaced', input: handShelf }
				})
			),
		expect: write
	},
	{
		route: 'DELETE /analyses/{id}',
		call: async (a, c, p) =>
			analysisApi.DELETE(
				event({ actor: a, method: 'DELETE', params: { id: await analysisOf(c, p) } })
			),
		expect: write
	},
	{
		route: 'POST /analyses/{id}/undelete',
		call: async (a, c, p) => {
			const id = await analysisOf(c, p);
			await deleteAnalysis(c.owner, id);
			return undeleteApi.POST(event({ actor: a, method: 'POST', params: { id } }));
		},
		expect: write
	},
	{
		route: 'GET /analyses/{id}/revisions',
		call: async (a, c, p) =>
			revisionsApi.GET(event({ actor: a, params: { id: await analysisOf(c, p) } })),
		expect: read
	},
	{
		route: 'GET /analyses/{id}/revisions/{version}',
		call: async (a, c, p) =>
			revisionApi.GET(event({ actor: a, params: { id: await analysisOf(c, p), version: '1' } })),
		expect: read
	},
	{
		route: 'POST /analyses/{id}/revisions/{version}',
		call: async (a, c, p) => {
			const id = await analysisOf(c, p);
			await updateAnalysis(c.owner, id, { name: 'Second', version: 1 });
			return revisionApi.POST(
				event({ actor: a, method: 'POST', params: { id, version: '1' }, body: {} })
			);
		},
		expect: write
	},
	{
		route: 'POST /analyses/{id}/duplicate',
		call: async (a, c, p) =>
			duplicateApi.POST(
				event({ actor: a, method: 'POST', params: { id: await analysisOf(c, p) }, body: {} })
			),
		expect: { ...write, editor: 201, owner: 201 }
	},
	{
		route: 'POST /analyses/{id}/move',
		call: async (a, c, p) => {
			const target = await createProject(c.owner, c.workshopId, {
				name: 'Hall',
				client: '',
				siteNotes: ''
			});
			return moveApi.POST(
				event({
					actor: a,
					method: 'POST',
					params: { id: await analysisOf(c, p) },
					body: { projectId: target.id }
				})
			);
		},
		expect: write
	}
);

// ---- the record as a PDF (API), and the share link's pages (no account) ----
table.push(
	{
		route: 'GET /projects/{id}/record.pdf',
		call: (a, _c, id) => projectPdfApi.GET(event({ actor: a, params: { id } })),
		expect: read
	},
	{
		route: 'GET /analyses/{id}/record.pdf',
		call: async (a, c, p) =>
			analysisPdfApi.GET(event({ actor: a, params: { id: await analysisOf(c, p) } })),
		expect: read
	}
);

// the share link opens for whoever holds its token, signed in or not, and for nobody else
const holderOnly = {
	anonymous: 404,
	client: 404,
	otherClient: 404,
	viewer: 404,
	editor: 404,
	owner: 404,
	outsider: 404,
	shareHolder: 200
};
const shared: {
	route: string;
	open: (token: string) => Promise<Response> | Response;
	revoked?: boolean;
}[] = [
	{
		route: 'GET /shared/{token}',
		open: async (token) => {
			try {
				await sharedPage.load({ params: { token }, setHeaders: () => {} } as never);
				return new Response(null, { status: 200 });
			} catch (e) {
				return new Response(null, { status: (e as { status: number }).status });
			}
		}
	},
	{
		route: 'GET /shared/{token}/record.pdf',
		open: async (token) => {
			try {
				return await sharedPdf.GET({ params: { token } } as never);
			} catch (e) {
				return new Response(null, { status: (e as { status: number }).status });
			}
		}
	}
];
for (const s of [...shared])
	shared.push({ ...s, route: `${s.route} after revoking`, revoked: true });

// ---- the actor's own account: tokens belong to a person, not to a workshop ----
table.push(
	{
		route: 'GET /me',
		call: (a) => meApi.GET(event({ actor: a })),
		expect: {
			anonymous: 401,
			client: 200,
			otherClient: 200,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 200,
			shareHolder: 401
		}
	},
	{
		route: 'GET /tokens',
		call: (a) => tokensApi.GET(event({ actor: a })),
		expect: {
			anonymous: 401,
			client: 200,
			otherClient: 200,
			viewer: 200,
			editor: 200,
			owner: 200,
			outsider: 200,
			shareHolder: 401
		}
	},
	{
		route: 'POST /tokens',
		call: (a) =>
			tokensApi.POST(event({ actor: a, method: 'POST', body: { name: 'Cut-list script' } })),
		expect: {
			anonymous: 401,
			client: 201,
			otherClient: 201,
			viewer: 201,
			editor: 201,
			owner: 201,
			outsider: 201,
			shareHolder: 401
		}
	},
	{
		route: "DELETE /tokens/{id} (the owner's token)",
		call: async (a, c) => {
			const { id } = await createApiToken(c.owner, { name: 'Shop laptop' });
			return tokenApi.DELETE(event({ actor: a, method: 'DELETE', params: { id } }));
		},
		expect: {
			anonymous: 401,
			client: 404,
			otherClient: 404,
			viewer: 404,
			editor: 404,
			owner: 204,
			outsider: 404,
			shareHolder: 401
		}
	}
);

const whos: Who[] = [
	'anonymous',
	'client',
	'otherClient',
	'viewer',
	'editor',
	'owner',
	'outsider',
	'shareHolder'
];

describe('share links: only the token opens the record', () => {
	for (const row of shared)
		for (const who of whos) {
			const expected = row.revoked ? 404 : holderOnly[who];
			it(`${row.route} as ${who} → ${expected}`, async () => {
				const cast = await makeWorkshopWithCast();
				const project = await createProject(cast.owner, cast.workshopId, {
					name: 'Bookcase',
					client: 'Ada Client',
					siteNotes: ''
				});
				await saveShelf(cast.owner, project.id);
				const { link, token } = await createShareLink(cast.editor, project.id, { days: 7 });
				if (row.revoked) await revokeShareLink(cast.editor, project.id, link.id);
				// everyone but the holder presents a token of the right shape that is not this one
				const presented = who === 'shareHolder' ? token : randomBytes(32).toString('base64url');
				const res = await row.open(presented);
				expect(res.status).toBe(expected);
			});
		}
});

describe('authorization of every stored-data API route', () => {
	for (const row of table)
		for (const who of whos)
			it(`${row.route} as ${who} → ${row.expect[who]}`, async () => {
				// a fresh workshop and project per case, so a delete in one case cannot colour another
				const cast = await makeWorkshopWithCast();
				const project = await createProject(cast.owner, cast.workshopId, {
					name: 'Bookcase',
					client: '',
					siteNotes: ''
				});
				await grantProject(cast.client, project.id);
				const pantry = await createProject(cast.owner, cast.workshopId, {
					name: 'Pantry',
					client: 'Another client',
					siteNotes: ''
				});
				await grantProject(cast.otherClient, pantry.id);
				const actor = who === 'anonymous' || who === 'shareHolder' ? null : cast[who];
				const res = await row.call(actor, cast, project.id);
				expect(res.status).toBe(row.expect[who]);
				if (res.status >= 400) {
					const body = await res.json();
					expect(typeof body.error).toBe('string');
					expect(Array.isArray(body.issues)).toBe(true);
				}
			});
});
