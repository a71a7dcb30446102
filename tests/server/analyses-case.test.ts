import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { makeWorkshopWithCast } from './support/actors';
import { type CaseResult } from '../../src/lib/engine/case';
import { checkCase, type CaseDesignInput } from '../../src/lib/compute';
import { type JointPlan } from '../../src/lib/engine/joinery';
import { planJoint } from '../../src/lib/compute';
import { createProject } from '../../src/lib/server/projects';
import { createAnalysis, duplicateAnalysis } from '../../src/lib/server/analyses';

useTempDb();

// an 80" bookcase of 3/4" plywood, three shelves under 40 lbf/ft² (the Architectural Woodwork
// Standards design load), bracketed into studs: the same design the case engine's tests use
const bookcase: CaseDesignInput = {
	name: 'Bay 1',
	width: '36"',
	height: '80"',
	depth: '12"',
	sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
	shelves: [
		{ height: '20"', kind: 'adjustable', loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }] },
		{
			height: '40"',
			kind: 'fixed',
			joint: 'pocket-screw',
			loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }]
		},
		{ height: '60"', kind: 'adjustable', loads: [{ kind: 'area', pressure: '40 lbf/ft^2' }] }
	],
	anchoring: { kind: 'bracket', intoStuds: true }
};

const joint = {
	kind: 'shelf-to-side',
	fastener: 'pocket-screw',
	length: '11 1/4"',
	endPiece: { material: 'red-oak', thickness: '3/4"' },
	facePiece: { material: 'mdf', thickness: '19 mm' },
	demand: { shear: '40 lbf' }
};

async function setup() {
	const cast = await makeWorkshopWithCast();
	const project = await createProject(cast.owner, cast.workshopId, {
		name: 'Nook',
		client: '',
		siteNotes: ''
	});
	return { cast, projectId: project.id };
}

describe('case and joint analyses', () => {
	it('saves a case design with the whole-case check, and its stored input validates again', async () => {
		const { cast, projectId } = await setup();
		const saved = await createAnalysis(cast.editor, projectId, {
			kind: 'case',
			name: 'Bay 1',
			input: bookcase
		});
		const expected = checkCase(bookcase);
		const result = saved.result as CaseResult;
		expect(result.margins.map((m) => m.margin)).toEqual(expected.margins.map((m) => m.margin));
		expect(saved.pass).toBe(expected.pass);
		expect(saved.summary).toMatch(/^(All \d+ checks pass|\d+ of \d+ checks fail)/);
		// duplicating re-validates the stored (SI) input and recomputes the same answer
		const copy = await duplicateAnalysis(cast.editor, saved.id);
		expect((copy.result as CaseResult).margins).toEqual(result.margins);
	});

	it('saves a joint plan from the joinery engine', async () => {
		const { cast, projectId } = await setup();
		const saved = await createAnalysis(cast.editor, projectId, {
			kind: 'joint',
			name: 'Fixed shelf',
			input: joint
		});
		const plan = planJoint(joint as Parameters<typeof planJoint>[0]);
		expect((saved.result as JointPlan).count).toBe(plan.count);
		expect(saved.pass).toBe(plan.pass);
		expect(saved.summary).toContain(`${plan.count} pocket screw`);
		expect((await duplicateAnalysis(cast.editor, saved.id)).result).toEqual(saved.result);
		await expect(
			createAnalysis(cast.editor, projectId, {
				kind: 'joint',
				name: 'Bad',
				input: { ...joint, length: 'ten' }
			})
		).rejects.toThrow(
			expect.objectContaining({
				status: 422,
				issues: [expect.objectContaining({ path: ['input', 'length'] })]
			})
		);
	});
});
