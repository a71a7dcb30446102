/**
 * Issue 15 item 1 through the routes: what is typed survives save → reload → save again →
 * duplicate → restore an earlier version, byte for byte in what is stored and exactly in what the
 * field shows. A 23/32" thickness, a metric 18 mm, and a bare number in each unit system; a shelf
 * over a divider with spans of its own and a 23/32" divider.
 */
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { event, makeWorkshopWithCast } from './support/actors';
import * as duplicateApi from '../../src/routes/api/v1/analyses/[id]/duplicate/+server';
import * as revisionApi from '../../src/routes/api/v1/analyses/[id]/revisions/[version]/+server';
import { createAnalysis, getAnalysis, updateAnalysis } from '../../src/lib/server/analyses';
import { createProject } from '../../src/lib/server/projects';
import type { UserLengthUnit } from '../../src/lib/workbench/lengths';
import {
	defaultDraft,
	fromInput,
	toRequest,
	type ShelfDraft
} from '../../src/lib/workbench/shelf-draft';

useTempDb();

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959)
const IN = 0.0254;
// 18 mm as the length reader computes it (18 × 0.001, one unit in the last place above 0.018)
const MM18 = 18 * 0.001;

const CASES: {
	name: string;
	unit: UserLengthUnit;
	change: Partial<ShelfDraft>;
	/** the stored thickness, m */
	metres: number;
	/** what the thickness field shows after every step */
	shown: string;
}[] = [
	{
		name: '23/32"',
		unit: 'frac16',
		change: { thickness: '23/32"' },
		metres: (23 / 32) * IN,
		shown: '23/32"'
	},
	{
		name: 'bare 23/32 (inches)',
		unit: 'frac16',
		change: { thickness: '23/32' },
		metres: (23 / 32) * IN,
		shown: '23/32"'
	},
	{
		name: 'bare 0.71875 (inches, 1/32" display)',
		unit: 'frac32',
		change: { thickness: '0.71875' },
		metres: (23 / 32) * IN,
		shown: '23/32"'
	},
	{ name: '18 mm', unit: 'mm', change: { thickness: '18 mm' }, metres: MM18, shown: '18 mm' },
	{
		name: 'bare 18 (millimetres)',
		unit: 'mm',
		change: { thickness: '18' },
		metres: MM18,
		shown: '18 mm'
	},
	{
		name: '23/32" to a metric user',
		unit: 'mm',
		change: { thickness: '23/32"' },
		metres: (23 / 32) * IN,
		shown: '23/32"'
	},
	{
		name: 'spans of their own over a 23/32" divider',
		unit: 'frac16',
		change: {
			thickness: '23/32',
			support: 'continuous',
			spans: ['23 5/8', '35 1/4'],
			divider: '23/32'
		},
		metres: (23 / 32) * IN,
		shown: '23/32"'
	}
];

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Exact shelves',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}

async function storedOf(actor: Parameters<typeof getAnalysis>[0], id: string) {
	const { analysis } = await getAnalysis(actor, id);
	const input = analysis.input as { thickness: number; support: unknown };
	return { analysis, input, bytes: JSON.stringify(analysis.input) };
}

describe('the exact round trip through save, reload, duplicate and restore', () => {
	for (const c of CASES)
		it(c.name, async () => {
			const { cast, projectId } = await setup();
			const typed = { ...defaultDraft(c.unit), ...c.change };

			// save (the screen sends the draft's request; the server validates and stores SI)
			const saved = await createAnalysis(cast.editor, projectId, {
				kind: 'shelf',
				name: 'Exact shelf',
				input: toRequest(typed, c.unit)
			});
			const first = await storedOf(cast.editor, saved.id);
			expect(first.input.thickness).toBe(c.metres);

			// reload: the field shows the exact value, and every field reads back as typed
			const reopened = fromInput(first.analysis.input, c.unit);
			expect(reopened.thickness).toBe(c.shown);
			if (c.change.spans) {
				expect(reopened.spans).toEqual(['23 5/8"', '35 1/4"']);
				expect(reopened.divider).toBe('23/32"');
				expect(first.input.support).toEqual({
					spans: [23.625 * IN, 35.25 * IN],
					ends: 'simple',
					divider: (23 / 32) * IN
				});
			}

			// "Save changes" after a rename: the reopened draft stores the same bytes
			const renamed = await updateAnalysis(cast.editor, saved.id, {
				name: 'Exact shelf, renamed',
				input: toRequest(reopened, c.unit),
				version: 1
			});
			expect(renamed.version).toBe(2);
			expect((await storedOf(cast.editor, saved.id)).bytes).toBe(first.bytes);

			// duplicate through its route: the copy stores the same bytes and reopens the same
			const dup = await duplicateApi.POST(
				event({ actor: cast.editor, method: 'POST', params: { id: saved.id }, body: {} })
			);
			expect(dup.status).toBe(201);
			const copy = await storedOf(cast.editor, (await dup.json()).id);
			expect(copy.bytes).toBe(first.bytes);
			expect(fromInput(copy.analysis.input, c.unit)).toEqual(reopened);

			// a different thickness, then restore version 1 through its route: the bytes come back
			await updateAnalysis(cast.editor, saved.id, {
				input: toRequest({ ...reopened, thickness: c.unit === 'mm' ? '25 mm' : '1' }, c.unit),
				version: 2
			});
			expect((await storedOf(cast.editor, saved.id)).bytes).not.toBe(first.bytes);
			const restored = await revisionApi.POST(
				event({
					actor: cast.editor,
					method: 'POST',
					params: { id: saved.id, version: '1' },
					body: {}
				})
			);
			expect(restored.status).toBe(200);
			const back = await storedOf(cast.editor, saved.id);
			expect(back.analysis.version).toBe(4);
			expect(back.bytes).toBe(first.bytes);
			expect(fromInput(back.analysis.input, c.unit)).toEqual(reopened);
			expect(back.analysis.result).toEqual(first.analysis.result);
		});
});
