// Every API route that touches stored data × who is asking → the expected status (the
// authorization test asserts the statuses; the API document test validates every answer).
// anonymous: no actor; viewer/student/editor/owner: members of the workshop (a class); outsider: a
// member of another; client: invited to this project alone; otherClient: invited to another project
// of the same workshop; shareHolder: no account, holding a share link to this project's record.
import { event, grantProject, makeWorkshopWithCast } from './actors';
import * as workshopsApi from '../../../src/routes/api/v1/workshops/+server';
import * as workshopApi from '../../../src/routes/api/v1/workshops/[id]/+server';
import * as projectsApi from '../../../src/routes/api/v1/projects/+server';
import * as projectApi from '../../../src/routes/api/v1/projects/[id]/+server';
import { createProject } from '../../../src/lib/server/projects';
import * as analysesApi from '../../../src/routes/api/v1/projects/[id]/analyses/+server';
import * as analysisApi from '../../../src/routes/api/v1/analyses/[id]/+server';
import * as undeleteApi from '../../../src/routes/api/v1/analyses/[id]/undelete/+server';
import * as revisionsApi from '../../../src/routes/api/v1/analyses/[id]/revisions/+server';
import * as revisionApi from '../../../src/routes/api/v1/analyses/[id]/revisions/[version]/+server';
import * as duplicateApi from '../../../src/routes/api/v1/analyses/[id]/duplicate/+server';
import * as moveApi from '../../../src/routes/api/v1/analyses/[id]/move/+server';
import { deleteAnalysis, updateAnalysis } from '../../../src/lib/server/analyses';
import { handShelf, saveShelf } from './analyses';
import type { Actor } from '../../../src/lib/server/access';
import * as meApi from '../../../src/routes/api/v1/me/+server';
import * as tokensApi from '../../../src/routes/api/v1/tokens/+server';
import * as tokenApi from '../../../src/routes/api/v1/tokens/[id]/+server';
import { createApiToken } from '../../../src/lib/server/accounts/api-tokens';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as documentsApi from '../../../src/routes/api/v1/projects/[id]/documents/+server';
import * as documentApi from '../../../src/routes/api/v1/documents/[id]/+server';
import * as documentUndeleteApi from '../../../src/routes/api/v1/documents/[id]/undelete/+server';
import { addDocument, deleteDocument } from '../../../src/lib/server/documents';
import { useStore } from '../../../src/lib/server/storage';
import { folderStore } from '../../../src/lib/server/storage/folder';
import * as classSessionsApi from '../../../src/routes/api/v1/class-sessions/+server';
import * as classSessionApi from '../../../src/routes/api/v1/class-sessions/[id]/+server';
import * as classApi from '../../../src/routes/api/v1/class/[code]/+server';
import * as classSeatsApi from '../../../src/routes/api/v1/class/[code]/seats/+server';
import * as classAnswerApi from '../../../src/routes/api/v1/class/[code]/answer/+server';
import { joinClass, startClassSession } from '../../../src/lib/server/class-sessions';

// uploads made by these rows go to a scratch folder, never the repository's data folder
useStore(folderStore(mkdtempSync(join(tmpdir(), 'spanwright-api-files-'))));
const drawingPdf = new TextEncoder().encode(
	'%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n'
);
const documentOf = async (c: Cast, p: string) =>
	(
		await addDocument(
			c.editor,
			p,
			{ bytes: drawingPdf, name: 'elevation.pdf' },
			{ caption: 'Elevation', analysisId: null }
		)
	).id;
async function upload(actor: Actor | null, projectId: string) {
	const body = new FormData();
	body.append('file', new Blob([drawingPdf]), 'section.pdf');
	body.append('caption', 'Section A');
	return documentsApi.POST({
		locals: { actor },
		params: { id: projectId },
		url: new URL('http://localhost/'),
		request: new Request('http://localhost/', { method: 'POST', body })
		// eslint-disable-next-line @typescript-eslint/no-explicit-any
	} as any);
}

export type Who =
	| 'anonymous'
	| 'client'
	| 'otherClient'
	| 'viewer'
	| 'student'
	| 'editor'
	| 'owner'
	| 'outsider'
	| 'shareHolder';
export const WHOS: Who[] = [
	'anonymous',
	'client',
	'otherClient',
	'viewer',
	'student',
	'editor',
	'owner',
	'outsider',
	'shareHolder'
];
type Cast = Awaited<ReturnType<typeof makeWorkshopWithCast>>;
export interface Row {
	route: string;
	call: (actor: Actor | null, cast: Cast, projectId: string) => Promise<Response> | Response;
	/**
	 * a student (of a class) is expected to fare as a viewer, a client of another project as an
	 * outsider (they learn nothing of this one) and a share link's holder as anonymous (the API
	 * takes no share link), unless the row says otherwise
	 */
	expect: Record<Exclude<Who, 'student' | 'otherClient' | 'shareHolder'>, number> &
		Partial<Record<'student' | 'otherClient' | 'shareHolder', number>>;
}

/** The status a row expects for one of the cast. */
export function expected(row: Row, who: Who): number {
	const e = row.expect;
	if (who === 'student') return e.student ?? e.viewer;
	if (who === 'otherClient') return e.otherClient ?? e.outsider;
	if (who === 'shareHolder') return e.shareHolder ?? e.anonymous;
	return e[who];
}

/**
 * A fresh workshop (a class) with its cast, and a project of it to which the client is invited;
 * the other client is invited to a second project of the same workshop.
 */
export async function castWithProject() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Bookcase',
		client: 'Ines',
		siteNotes: 'Stair hall'
	});
	await grantProject(cast.client, project.id);
	const pantry = await createProject(cast.owner, cast.workshopId, {
		name: 'Pantry',
		client: 'Another client',
		siteNotes: ''
	});
	await grantProject(cast.otherClient, pantry.id);
	return { cast, project };
}

/** The actor one of the cast signs in as: none for anonymous and for a share link's holder. */
export const actorOf = (cast: Cast, who: Who): Actor | null =>
	who === 'anonymous' || who === 'shareHolder' ? null : cast[who];

export const table: Row[] = [
	{
		route: 'GET /workshops',
		call: (a) => workshopsApi.GET(event({ actor: a })),
		expect: { anonymous: 401, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 200 }
	},
	{
		route: 'POST /workshops',
		call: (a) =>
			workshopsApi.POST(event({ actor: a, method: 'POST', body: { name: 'Night class' } })),
		expect: { anonymous: 401, client: 201, viewer: 201, editor: 201, owner: 201, outsider: 201 }
	},
	{
		route: 'GET /workshops/{id}',
		call: (a, c) => workshopApi.GET(event({ actor: a, params: { id: c.workshopId } })),
		expect: { anonymous: 401, client: 404, viewer: 200, editor: 200, owner: 200, outsider: 404 }
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
		expect: { anonymous: 401, client: 404, viewer: 403, editor: 403, owner: 200, outsider: 404 }
	},
	{
		route: 'DELETE /workshops/{id}',
		call: (a, c) =>
			workshopApi.DELETE(event({ actor: a, method: 'DELETE', params: { id: c.workshopId } })),
		expect: { anonymous: 401, client: 404, viewer: 403, editor: 403, owner: 204, outsider: 404 }
	},
	{
		route: 'GET /projects',
		call: (a, c) => projectsApi.GET(event({ actor: a, url: `/?workshop=${c.workshopId}` })),
		expect: { anonymous: 401, client: 404, viewer: 200, editor: 200, owner: 200, outsider: 404 }
	},
	{
		route: 'POST /projects',
		call: (a, c) =>
			projectsApi.POST(
				event({ actor: a, method: 'POST', body: { workshopId: c.workshopId, name: 'Wall unit' } })
			),
		expect: { anonymous: 401, client: 404, viewer: 403, editor: 201, owner: 201, outsider: 404 }
	},
	{
		route: 'GET /projects/{id}',
		call: (a, _c, id) => projectApi.GET(event({ actor: a, params: { id } })),
		expect: { anonymous: 401, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 404 }
	},
	{
		route: 'PATCH /projects/{id}',
		call: (a, _c, id) =>
			projectApi.PATCH(
				event({ actor: a, method: 'PATCH', params: { id }, body: { client: 'New client' } })
			),
		expect: { anonymous: 401, client: 403, viewer: 403, editor: 200, owner: 200, outsider: 404 }
	},
	{
		route: 'DELETE /projects/{id}',
		call: (a, _c, id) => projectApi.DELETE(event({ actor: a, method: 'DELETE', params: { id } })),
		expect: { anonymous: 401, client: 403, viewer: 403, editor: 204, owner: 204, outsider: 404 }
	}
];

// ---- saved analyses: each case saves one (as the owner) in the case's project ----
// a client reads their own project's analyses and changes nothing; a client of another project
// learns nothing (404); the API takes no share link, so its holder is anonymous there
const read = { anonymous: 401, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 404 };
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
		expect: { ...write, student: 201, editor: 201, owner: 201 }
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
		// a student may start from anyone's analysis: the copy is theirs
		expect: { ...write, student: 201, editor: 201, owner: 201 }
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

// ---- a student of a class: the analyses they saved themselves, and only those ----
const studentsOwn = async (c: Cast, projectId: string) =>
	(await saveShelf(c.student, projectId)).id;
const own = { ...write, student: 200 };
table.push(
	{
		route: "PATCH /analyses/{id} (a student's own)",
		call: async (a, c, p) =>
			analysisApi.PATCH(
				event({
					actor: a,
					method: 'PATCH',
					params: { id: await studentsOwn(c, p) },
					body: { version: 1, name: 'My pantry shelf' }
				})
			),
		expect: own
	},
	{
		route: "PUT /analyses/{id} (a student's own)",
		call: async (a, c, p) =>
			analysisApi.PUT(
				event({
					actor: a,
					method: 'PUT',
					params: { id: await studentsOwn(c, p) },
					body: { version: 1, name: 'Thicker', input: { ...handShelf, thickness: 0.025 } }
				})
			),
		expect: own
	},
	{
		route: "DELETE /analyses/{id} (a student's own)",
		call: async (a, c, p) =>
			analysisApi.DELETE(
				event({ actor: a, method: 'DELETE', params: { id: await studentsOwn(c, p) } })
			),
		expect: own
	},
	{
		route: "POST /analyses/{id}/undelete (a student's own)",
		call: async (a, c, p) => {
			const id = await studentsOwn(c, p);
			await deleteAnalysis(c.student, id);
			return undeleteApi.POST(event({ actor: a, method: 'POST', params: { id } }));
		},
		expect: own
	},
	{
		route: "POST /analyses/{id}/move (a student's own)",
		call: async (a, c, p) => {
			const target = await createProject(c.owner, c.workshopId, {
				name: 'Second bay',
				client: '',
				siteNotes: ''
			});
			return moveApi.POST(
				event({
					actor: a,
					method: 'POST',
					params: { id: await studentsOwn(c, p) },
					body: { projectId: target.id }
				})
			);
		},
		expect: own
	}
);

// ---- the actor's own account: tokens belong to a person, not to a workshop ----
table.push(
	{
		route: 'GET /me',
		call: (a) => meApi.GET(event({ actor: a })),
		expect: { anonymous: 401, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 200 }
	},
	{
		route: 'GET /tokens',
		call: (a) => tokensApi.GET(event({ actor: a })),
		expect: { anonymous: 401, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 200 }
	},
	{
		route: 'POST /tokens',
		call: (a) =>
			tokensApi.POST(event({ actor: a, method: 'POST', body: { name: 'Cut-list script' } })),
		expect: { anonymous: 401, client: 201, viewer: 201, editor: 201, owner: 201, outsider: 201 }
	},
	{
		route: "DELETE /tokens/{id} (the owner's token)",
		call: async (a, c) => {
			const { id } = await createApiToken(c.owner, { name: 'Shop laptop' });
			return tokenApi.DELETE(event({ actor: a, method: 'DELETE', params: { id } }));
		},
		expect: { anonymous: 401, client: 404, viewer: 404, editor: 404, owner: 204, outsider: 404 }
	},
	{
		route: 'GET /projects/{id}/documents',
		call: (a, _c, p) => documentsApi.GET(event({ actor: a, params: { id: p } })),
		expect: read
	},
	{
		route: 'POST /projects/{id}/documents',
		call: async (a, _c, p) => await upload(a, p),
		expect: { ...write, editor: 201, owner: 201 }
	},
	{
		route: 'GET /documents/{id}',
		call: async (a, c, p) =>
			documentApi.GET(event({ actor: a, params: { id: await documentOf(c, p) } })),
		expect: read
	},
	{
		route: 'PATCH /documents/{id}',
		call: async (a, c, p) =>
			documentApi.PATCH(
				event({
					actor: a,
					method: 'PATCH',
					params: { id: await documentOf(c, p) },
					body: { caption: 'North elevation', inRecord: true }
				})
			),
		expect: write
	},
	{
		route: 'DELETE /documents/{id}',
		call: async (a, c, p) =>
			documentApi.DELETE(
				event({ actor: a, method: 'DELETE', params: { id: await documentOf(c, p) } })
			),
		expect: write
	},
	{
		route: 'POST /documents/{id}/undelete',
		call: async (a, c, p) => {
			const id = await documentOf(c, p);
			await deleteDocument(c.editor, id);
			return documentUndeleteApi.POST(event({ actor: a, method: 'POST', params: { id } }));
		},
		expect: write
	}
);

// ---- class sessions: the teacher's own (a session belongs to the person who started it) and the
// class's side, open to anyone with the join code ----
const sessionOf = (c: Cast) => startClassSession(c.owner, { experiment: 'span', step: 0 });
const hostOnly = {
	anonymous: 401,
	client: 404,
	viewer: 404,
	editor: 404,
	owner: 200,
	outsider: 404
};
const anyone = { anonymous: 200, client: 200, viewer: 200, editor: 200, owner: 200, outsider: 200 };
table.push(
	{
		route: 'GET /class-sessions',
		call: (a) => classSessionsApi.GET(event({ actor: a })),
		expect: { ...anyone, anonymous: 401 }
	},
	{
		route: 'POST /class-sessions',
		call: (a) =>
			classSessionsApi.POST(
				event({ actor: a, method: 'POST', body: { experiment: 'thickness', step: 0 } })
			),
		expect: { anonymous: 401, client: 201, viewer: 201, editor: 201, owner: 201, outsider: 201 }
	},
	{
		route: "GET /class-sessions/{id} (the owner's session)",
		call: async (a, c) =>
			classSessionApi.GET(event({ actor: a, params: { id: (await sessionOf(c)).id } })),
		expect: hostOnly
	},
	{
		route: "PATCH /class-sessions/{id} (the owner's session)",
		call: async (a, c) =>
			classSessionApi.PATCH(
				event({
					actor: a,
					method: 'PATCH',
					params: { id: (await sessionOf(c)).id },
					body: { revealed: true }
				})
			),
		expect: hostOnly
	},
	{
		route: "DELETE /class-sessions/{id} (the owner's session)",
		call: async (a, c) =>
			classSessionApi.DELETE(
				event({ actor: a, method: 'DELETE', params: { id: (await sessionOf(c)).id } })
			),
		expect: { ...hostOnly, owner: 204 }
	},
	{
		route: 'GET /class/{code}',
		call: async (a, c) =>
			classApi.GET(event({ actor: a, params: { code: (await sessionOf(c)).code } })),
		expect: anyone
	},
	{
		route: 'POST /class/{code}/seats',
		call: async (a, c) =>
			classSeatsApi.POST(
				event({
					actor: a,
					method: 'POST',
					params: { code: (await sessionOf(c)).code },
					body: { nickname: 'Robin' }
				})
			),
		expect: { anonymous: 201, client: 201, viewer: 201, editor: 201, owner: 201, outsider: 201 }
	},
	{
		route: 'PUT /class/{code}/answer',
		call: async (a, c) => {
			const { code } = await sessionOf(c);
			const { seat } = await joinClass(code, 'Robin');
			return classAnswerApi.PUT(
				event({ actor: a, method: 'PUT', params: { code }, body: { seat, choice: 'x16' } })
			);
		},
		expect: anyone
	}
);
