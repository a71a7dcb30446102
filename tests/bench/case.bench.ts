import { bench, describe } from 'vitest';
import { checkCaseSI } from '../../src/lib/engine/case';
import { checkCase } from '../../src/lib/compute';
import { caseDesignSchema, type CaseDesignInput } from '../../src/lib/schemas/case';

/** A 96"-tall library case, 36" wide, with 12 shelves at 40 lbf/ft² (every fourth one fixed). */
const twelveShelves: CaseDesignInput = {
	name: 'Library wall, bay 1',
	width: '36"',
	height: '96"',
	depth: '12"',
	sides: { material: 'hardwood-plywood-veneer-core', thickness: '3/4"' },
	back: { material: 'hardwood-plywood-veneer-core', thickness: '1/4"' },
	shelves: Array.from({ length: 12 }, (_, i) => ({
		height: `${8 + i * 7}"`,
		kind: i % 4 === 3 ? ('fixed' as const) : ('adjustable' as const),
		joint: 'pocket-screw' as const,
		loads: [{ kind: 'area' as const, pressure: '40 lbf/ft^2' }]
	})),
	faceFrame: { material: 'red-oak', thickness: '3/4"', stileWidth: '1 1/2"', railWidth: '2 1/2"' },
	base: { height: '4"', setback: '3"' },
	anchoring: { kind: 'bracket', intoStuds: true }
};

/** The same shelves with a different load each, so no analysis repeats within one check. */
const twelveDifferent: CaseDesignInput = {
	...twelveShelves,
	shelves: twelveShelves.shelves!.map((s, i) => ({
		...s,
		loads: [{ kind: 'area' as const, pressure: `${20 + i * 2} lbf/ft^2` }]
	}))
};

const parsed = caseDesignSchema.parse(twelveShelves);

/** The bare closed form a hand check would use: 12 simply supported sags, 5wL⁴/384EI, inline.
 * Printed beside checkCase so the ratio on the same machine in the same run is the figure. */
let sink = 0;
function bareFormulas() {
	for (let i = 0; i < 12; i++) {
		const w = 1915 * 0.29 + i; // N/m
		const l = 0.8763;
		const ei = 1.8e9 * ((0.29 * 0.019 ** 3) / 12);
		sink += (5 * w * l ** 4) / (384 * ei);
	}
}

describe('checkCase, a case of 12 shelves', () => {
	bench('checkCase (JSON with quantity strings in)', () => {
		checkCase(twelveShelves);
	});
	bench('checkCaseSI (design already parsed)', () => {
		checkCaseSI(parsed);
	});
	bench('checkCase, 12 different shelf loads (no repeated analysis)', () => {
		checkCase(twelveDifferent);
	});
	bench('baseline: 12 bare sag formulas inline', () => {
		bareFormulas();
		if (sink < 0) throw new Error('unreachable');
	});
});
