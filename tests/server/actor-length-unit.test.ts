import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { actorForUserId } from '../../src/lib/server/accounts/users';
import { setLengthUnit } from '../../src/lib/server/accounts/profile';
import { listAnalyses } from '../../src/lib/server/analyses';
import { createProject } from '../../src/lib/server/projects';
import { lengthUnitOf } from '../../src/lib/server/preferences';

useTempDb();

describe('the actor carries their length unit', () => {
	it('is read with the actor, and a change of unit is seen by the rest of the request', async () => {
		const cast = await makeWorkshopWithCast();
		expect((await actorForUserId(cast.editor.id))?.lengthUnit).toBe('frac16');
		await setLengthUnit(cast.editor, 'mm');
		const actor = (await actorForUserId(cast.editor.id))!;
		expect(actor.lengthUnit).toBe('mm');
		await setLengthUnit(actor, 'decimal-in');
		expect(actor.lengthUnit).toBe('decimal-in');
	});

	it('a list writes every row in the unit carried with the actor, not the stored one read again', async () => {
		const cast = await makeWorkshopWithCast();
		const project = await createProject(cast.owner, cast.workshopId, {
			name: 'Den',
			client: '',
			siteNotes: ''
		});
		await saveShelf(cast.owner, project.id, 'One');
		await saveShelf(cast.owner, project.id, 'Two');
		// the stored unit says 1/16"; the actor of this request says mm: the rows follow the actor
		const actor = { ...(await actorForUserId(cast.viewer.id))!, lengthUnit: 'mm' as const };
		expect(await lengthUnitOf(actor)).toBe('mm');
		const query = { q: '', sort: 'name', dir: 'asc', page: 1, perPage: 10 } as const;
		const rows = (await listAnalyses(actor, project.id, query)).items;
		// the hand-worked shelf sags 1.25 mm (tests/server/support/analyses.ts), shown to a tenth
		for (const row of rows) {
			expect(row.summary).toMatch(/^Sags 1\.[23] mm/);
			expect(row.summary).not.toContain('"');
		}
		const inInches = (await listAnalyses(cast.viewer, project.id, query)).items;
		for (const row of inInches) expect(row.summary).toContain('1/16"');
	});
});
