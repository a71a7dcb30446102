import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planJointSI, type FastenerKind, type JointRequest } from '../../src/lib/engine/joinery';
import { STOCK_HOLDING } from '../../reference/stock-holding';
import { allFinite } from './joinery-finite';

const ids = STOCK_HOLDING.map((s) => s.id);
const request = (
	fastener: FastenerKind,
	lengthM: number,
	t: number,
	end: string,
	face: string
): JointRequest => ({
	kind: 'shelf-to-side',
	fastener,
	lengthM,
	endPiece: { material: end, thicknessM: t },
	facePiece: { material: face, thicknessM: t },
	demand: { shearN: 100, momentNM: 2 }
});

describe('joint plans, property tests', () => {
	it('a longer joint never gets fewer fasteners', () => {
		fc.assert(
			fc.property(
				fc.constantFrom<FastenerKind>('biscuit', 'pocket-screw', 'screw'),
				fc.double({ min: 0.02, max: 2.5, noNaN: true }),
				fc.double({ min: 0, max: 1.5, noNaN: true }),
				fc.double({ min: 0.009, max: 0.045, noNaN: true }),
				fc.constantFrom(...ids),
				fc.constantFrom(...ids),
				(fastener, l1, extra, t, end, face) => {
					const short = planJointSI(request(fastener, l1, t, end, face));
					const long = planJointSI(request(fastener, l1 + extra, t, end, face));
					expect(long.count).toBeGreaterThanOrEqual(short.count);
				}
			),
			{ numRuns: 400 }
		);
	});

	it('every output is finite for valid input, with cautions and the estimate flag', () => {
		fc.assert(
			fc.property(
				fc.constantFrom<FastenerKind>('biscuit', 'pocket-screw', 'screw', 'shelf-pin', 'dado'),
				fc.double({ min: 0.02, max: 2.5, noNaN: true }),
				fc.double({ min: 0.003, max: 0.1, noNaN: true }),
				fc.constantFrom(...ids),
				fc.constantFrom(...ids),
				fc.double({ min: 0, max: 1e5, noNaN: true }),
				fc.double({ min: 0, max: 1e4, noNaN: true }),
				(fastener, lengthM, t, end, face, shearN, momentNM) => {
					const p = planJointSI({
						...request(fastener, lengthM, t, end, face),
						demand: { shearN, momentNM }
					});
					expect(allFinite(p)).toEqual([]);
					expect(p.estimate).toBe(true);
					expect(p.cautions.length).toBeGreaterThan(0);
					for (const c of p.checks) expect(c.utilisation).toBeGreaterThanOrEqual(0);
				}
			),
			{ numRuns: 400 }
		);
	});

	it('invalid numbers give a clear error naming the field, never a deep throw', () => {
		fc.assert(
			fc.property(fc.constantFrom(0, -1, NaN, Infinity), (bad) => {
				expect(() => planJointSI(request('biscuit', bad, 0.019, 'mdf', 'mdf'))).toThrow(
					/^lengthM: expected/
				);
				expect(() => planJointSI(request('pocket-screw', 0.3, bad, 'mdf', 'mdf'))).toThrow(
					/thicknessM: expected/
				);
			})
		);
	});

	// Fasteners that fit the joint (issue 15 item 9). Least centre-to-centre distance in a row:
	// a biscuit's slot length, a pocket's bore (3/8", common practice), a screw's spacing from
	// EN 1995-1-1 Table 8.2 (10·d below 5 mm), a shelf-pin hole's diameter.
	const least = (p: ReturnType<typeof planJointSI>): number =>
		p.fastener === 'shelf-pin' ? Number(p.spec.diameterM) : Number(p.spec.minSpacingM);
	const spaced: FastenerKind[] = ['biscuit', 'pocket-screw', 'screw', 'shelf-pin'];
	const withCount = (r: JointRequest, count: number | null): JointRequest =>
		count === null ? r : { ...r, options: { count } };

	it('no two slots or holes overlap, whatever the length or the count asked for', () => {
		fc.assert(
			fc.property(
				fc.constantFrom(...spaced),
				fc.double({ min: 0.02, max: 2.5, noNaN: true }),
				fc.double({ min: 0.009, max: 0.045, noNaN: true }),
				fc.constantFrom(...ids),
				fc.constantFrom(...ids),
				fc.option(fc.integer({ min: 1, max: 40 })),
				(fastener, lengthM, t, end, face, count) => {
					const p = planJointSI(withCount(request(fastener, lengthM, t, end, face), count));
					const gap = least(p);
					expect(gap).toBeGreaterThan(0);
					for (const row of new Set(p.positions.map((x) => x.row))) {
						const along = p.positions
							.filter((x) => x.row === row)
							.map((x) => x.alongM)
							.sort((a, b) => a - b);
						for (let i = 1; i < along.length; i++)
							expect(along[i] - along[i - 1]).toBeGreaterThanOrEqual(gap * (1 - 1e-9));
						for (const x of along) {
							expect(x).toBeGreaterThanOrEqual(0);
							expect(x).toBeLessThanOrEqual(lengthM);
						}
					}
				}
			),
			{ numRuns: 600 }
		);
	});

	it('the count never falls and no capacity drops as the joint gets longer', () => {
		fc.assert(
			fc.property(
				fc.constantFrom<FastenerKind>('biscuit', 'pocket-screw', 'screw', 'shelf-pin', 'dado'),
				fc.double({ min: 0.02, max: 2.5, noNaN: true }),
				fc.double({ min: 0, max: 0.5, noNaN: true }),
				fc.double({ min: 0.009, max: 0.045, noNaN: true }),
				fc.constantFrom(...ids),
				fc.constantFrom(...ids),
				fc.option(fc.integer({ min: 1, max: 40 })),
				(fastener, l1, extra, t, end, face, count) => {
					const short = planJointSI(withCount(request(fastener, l1, t, end, face), count));
					const long = planJointSI(withCount(request(fastener, l1 + extra, t, end, face), count));
					expect(long.count).toBeGreaterThanOrEqual(short.count);
					expect(long.checks.length).toBe(short.checks.length);
					short.checks.forEach((c, i) =>
						expect(long.checks[i].design).toBeGreaterThanOrEqual(c.design * (1 - 1e-12))
					);
				}
			),
			{ numRuns: 600 }
		);
	});
});
