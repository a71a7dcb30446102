import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { saveShelf } from './support/analyses';
import { escapeLike } from '../../src/lib/server/db/contains';
import { createProject, listProjects } from '../../src/lib/server/projects';
import { listAnalyses } from '../../src/lib/server/analyses';

useTempDb();

// Names with LIKE's special characters in them; a search for one must find exactly that one.
const NAMES = [
	'50% deeper shelves',
	'500 mm shelves',
	'shelf_a',
	'shelfXa',
	'C:\\plans',
	'C:plans'
];
const SEARCHES: [string, string[]][] = [
	['50%', ['50% deeper shelves']],
	['f_a', ['shelf_a']],
	['C:\\', ['C:\\plans']],
	['%', ['50% deeper shelves']],
	['_', ['shelf_a']],
	['\\', ['C:\\plans']]
];

describe('searching projects and analyses takes %, _ and \\ literally', () => {
	it('escapes the wildcards and the escape character', () => {
		expect(escapeLike('50%_a\\b')).toBe('50\\%\\_a\\\\b');
		expect(escapeLike('plain words')).toBe('plain words');
	});

	it('finds only the project whose name has the typed character', async () => {
		const cast = await makeWorkshopWithCast();
		for (const name of NAMES)
			await createProject(cast.editor, cast.workshopId, { name, client: '', siteNotes: '' });
		for (const [q, expected] of SEARCHES) {
			const found = await listProjects(cast.viewer, {
				workshop: cast.workshopId,
				q,
				sort: 'name',
				dir: 'asc',
				page: 1,
				perPage: 20
			});
			expect(
				found.items.map((p) => p.name),
				`search ${q}`
			).toEqual(expected);
		}
	});

	it('finds only the analysis whose name has the typed character', async () => {
		const cast = await makeWorkshopWithCast();
		const project = await createProject(cast.owner, cast.workshopId, {
			name: 'Den',
			client: '',
			siteNotes: ''
		});
		for (const name of NAMES) await saveShelf(cast.editor, project.id, name);
		// a bare % is left out here: every shelf summary has one ("… with 82% to spare")
		for (const [q, expected] of SEARCHES.filter(([q]) => q !== '%')) {
			const found = await listAnalyses(cast.viewer, project.id, {
				q,
				sort: 'name',
				dir: 'asc',
				page: 1,
				perPage: 20
			});
			expect(
				found.items.map((a) => a.name),
				`search ${q}`
			).toEqual(expected);
		}
	});
});
