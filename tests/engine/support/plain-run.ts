/**
 * The engine run by plain Node through tsx, with no SvelteKit, no aliases and no schemas: typed SI
 * input in, a result out. tests/engine/floor.test.ts runs this file and reads what it prints.
 */
import {
	DEFAULT_SHELF_OPTIONS,
	analyzeInput,
	checkStabilitySI,
	planJointSI
} from '../../../src/lib/engine';

const shelf = analyzeInput({
	span: 0.9144,
	depth: 0.2794,
	thickness: 0.01905,
	material: 'red-oak',
	grain: 'along',
	support: 'simple',
	loads: [{ kind: 'area', pressure: 1915.21 }],
	selfWeight: true,
	edges: [],
	duration: 'long',
	service: 'dry',
	limit: 'L/144',
	options: DEFAULT_SHELF_OPTIONS
});
const joint = planJointSI({
	kind: 'shelf-to-side',
	fastener: 'biscuit',
	lengthM: 0.2794,
	endPiece: { material: 'red-oak', thicknessM: 0.01905 },
	facePiece: { material: 'red-oak', thicknessM: 0.01905 },
	demand: { shearN: shelf.reactions[0].force }
});
const tipping = checkStabilitySI({
	heightM: 1.8,
	widthM: 0.9,
	depthM: 0.3,
	construction: { massKg: 40 }
});
console.log(
	JSON.stringify({
		sag: shelf.sag.longTerm,
		pass: shelf.limit.pass,
		biscuits: joint.count,
		tipsUnaided: tipping.tipsUnaided
	})
);
