import type { Actor } from '../access';
import { createAnalysis, updateAnalysis } from '../analyses';
import { defaultWall, toInput } from '../../wall-designer/draft';

// Saved analyses of the demo scenario (invented inputs; every result is computed by the engine
// when seeded). Tomas, the shop lead, saved them; Ines revised the library shelf once.

const books = [{ kind: 'area', pressure: '40 lbf/ft^2' }];
const oakNosing = { side: 'front', material: 'red-oak', height: '1 1/2"', thickness: '3/4"' };
const caseNosing = { material: 'red-oak', height: '1 1/2"', thickness: '3/4"' };

const libraryShelf = {
	span: '35 1/2"',
	depth: '11 1/4"',
	thickness: '23/32"',
	material: 'hardwood-plywood-veneer-core',
	loads: books,
	edges: [oakNosing]
};

const libraryComparison = {
	shelf: { span: '35 1/2"', depth: '11 1/4"', loads: books },
	candidates: [
		{ material: 'softwood-plywood', thickness: '23/32"', label: '3/4" softwood plywood' },
		{ material: 'mdf', thickness: '3/4"', label: '3/4" MDF' },
		{
			material: 'hardwood-plywood-veneer-core',
			thickness: '23/32"',
			edges: [oakNosing],
			label: '3/4" oak plywood + 1 1/2" oak nosing'
		}
	]
};

// Fails as drawn (bare melamine-faced particleboard creeps); a hardwood nosing fixes it.
const pantryShelf = {
	span: '24"',
	depth: '16"',
	thickness: '3/4"',
	material: 'melamine-particleboard',
	loads: books
};

const teacherCabinet = {
	name: 'Teacher cabinet',
	width: '36"',
	height: '84"',
	depth: '16"',
	sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
	// oak nosings: a bare 3/4" veneer-core plywood shelf over the 34 1/2" opening sags past L/144
	shelves: [
		{ height: '16"', kind: 'fixed', joint: 'pocket-screw', loads: books, nosing: caseNosing },
		{ height: '36"', kind: 'adjustable', loads: books, nosing: caseNosing },
		{ height: '56"', kind: 'adjustable', loads: books, nosing: caseNosing }
	],
	anchoring: { kind: 'bracket', intoStuds: true }
};

const fixedShelfJoint = {
	kind: 'shelf-to-side',
	fastener: 'pocket-screw',
	length: '11 1/4"',
	endPiece: { material: 'hardwood-plywood-veneer-core', thickness: '23/32"' },
	facePiece: { material: 'hardwood-plywood-veneer-core', thickness: '23/32"' },
	demand: { shear: '60 lbf' }
};

interface DemoUser {
	id: string;
	email: string;
	name: string;
	role: 'owner' | 'editor' | 'viewer' | 'client';
}

/** Save the demo analyses in the seeded projects (by name); returns the ids of what was saved. */
export async function seedDemoAnalyses(projectIds: Record<string, string>, users: DemoUser[]) {
	const actor = (role: DemoUser['role']): Actor => {
		const u = users.find((x) => x.role === role)!;
		return { id: u.id, email: u.email, name: u.name, via: 'session' };
	};
	const tomas = actor('editor');
	const library = projectIds['Whitlock library wall'];
	const school = projectIds['Harbour Street school reading nook'];
	const pantry = projectIds['Kiln Lane pantry'];
	const save = async (
		projectId: string,
		kind: 'shelf' | 'comparison' | 'joint' | 'case' | 'wall',
		name: string,
		input: unknown
	) => (await createAnalysis(tomas, projectId, { kind, name, input })).id;

	const shelf = await save(library, 'shelf', 'Left bookcase, middle shelf', {
		...libraryShelf,
		edges: []
	});
	// Ines added the oak nosing after the first check: version 2 of the same shelf
	await updateAnalysis(actor('owner'), shelf, { input: libraryShelf, version: 1 });
	return [
		shelf,
		await save(library, 'comparison', 'Shelf stock for the library wall', libraryComparison),
		await save(library, 'joint', 'Fixed shelf to case side', fixedShelfJoint),
		await save(pantry, 'shelf', 'Deep pantry shelf, appliance bay', pantryShelf),
		await save(school, 'case', 'Teacher cabinet', teacherCabinet),
		// a scenario of our own: two tall bookcases and two low drawer units, side by side
		await save(
			library,
			'wall',
			'Living-room wall, four units',
			toInput(defaultWall('frac16'), 'frac16')
		)
	];
}
