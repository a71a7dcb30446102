// Every API route that touches stored data × who is asking → the expected status.
// anonymous: no actor; viewer/editor/owner: members of the workshop; outsider: a member of another.
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { createProject } from '../../src/lib/server/projects';
import { expected, table, type Who } from './support/api-table';

useTempDb();

const whos: Who[] = ['anonymous', 'viewer', 'student', 'editor', 'owner', 'outsider'];

describe('authorization of every stored-data API route', () => {
	for (const row of table)
		for (const who of whos)
			it(`${row.route} as ${who} → ${expected(row, who)}`, async () => {
				// a fresh workshop and project per case, so a delete in one case cannot colour another
				const cast = await makeWorkshopWithCast();
				const project = await createProject(cast.owner, cast.workshopId, {
					name: 'Bookcase',
					client: '',
					siteNotes: ''
				});
				const actor = who === 'anonymous' ? null : cast[who];
				const res = await row.call(actor, cast, project.id);
				expect(res.status).toBe(expected(row, who));
				if (res.status >= 400) {
					const body = await res.json();
					expect(typeof body.error).toBe('string');
					expect(Array.isArray(body.issues)).toBe(true);
				}
			});
});
