import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkStabilitySI, type StabilityRequest } from '../../src/lib/engine/stability';
import { allFinite } from './joinery-finite';

const caseArb = fc.record({
	heightM: fc.double({ min: 0.6, max: 2.6, noNaN: true }),
	widthM: fc.double({ min: 0.3, max: 2.5, noNaN: true }),
	depthM: fc.double({ min: 0.2, max: 0.7, noNaN: true }),
	massKg: fc.double({ min: 5, max: 300, noNaN: true }),
	setbackFrac: fc.double({ min: 0, max: 0.3, noNaN: true }),
	tiltDeg: fc.double({ min: 0, max: 5, noNaN: true }),
	shelves: fc.array(
		fc.record({
			heightFrac: fc.double({ min: 0, max: 1, noNaN: true }),
			massKg: fc.double({ min: 0, max: 90, noNaN: true })
		}),
		{ minLength: 2, maxLength: 8 }
	),
	drawers: fc.array(
		fc.record({
			heightFrac: fc.double({ min: 0, max: 1, noNaN: true }),
			massKg: fc.double({ min: 0, max: 30, noNaN: true }),
			contentsKg: fc.double({ min: 0, max: 40, noNaN: true }),
			extensionFrac: fc.double({ min: 0, max: 1, noNaN: true })
		}),
		{ maxLength: 4 }
	)
});
type Case = typeof caseArb extends fc.Arbitrary<infer T> ? T : never;

const toRequest = (c: Case): StabilityRequest => ({
	heightM: c.heightM,
	widthM: c.widthM,
	depthM: c.depthM,
	construction: { massKg: c.massKg },
	contents: c.shelves.map((s) => ({ massKg: s.massKg, heightM: s.heightFrac * c.heightM })),
	drawers: c.drawers.map((d) => ({
		heightM: d.heightFrac * c.heightM,
		massKg: d.massKg,
		contentsKg: d.contentsKg,
		extensionM: d.extensionFrac * c.depthM
	})),
	base: { setbackM: c.setbackFrac * c.depthM },
	floorTiltDeg: c.tiltDeg,
	anchoring: { kind: 'strap', intoStuds: true }
});

const slack = (x: number) => 1e-9 * (1 + Math.abs(x));

describe('stability, property tests', () => {
	it('moving load to an upper shelf never makes the case more stable', () => {
		fc.assert(
			fc.property(
				caseArb,
				fc.nat(),
				fc.nat(),
				fc.double({ min: 0, max: 1, noNaN: true }),
				(c, a, b, share) => {
					const req = toRequest(c);
					const contents = req.contents!;
					const i = a % contents.length;
					const j = b % contents.length;
					// one shelf drawn twice would take the load away rather than move it up (seed 757704062)
					fc.pre(i !== j);
					const [lo, hi] = contents[i].heightM <= contents[j].heightM ? [i, j] : [j, i];
					const moved = contents[lo].massKg * share;
					const upper = contents.map((x, k) => ({
						...x,
						massKg: k === lo ? x.massKg - moved : k === hi ? x.massKg + moved : x.massKg
					}));
					const before = checkStabilitySI(req);
					const after = checkStabilitySI({ ...req, contents: upper });
					expect(after.tipForceAtTopN.loaded).toBeLessThanOrEqual(
						before.tipForceAtTopN.loaded + slack(before.tipForceAtTopN.loaded)
					);
					expect(after.tipAccelerationG.loaded).toBeLessThanOrEqual(
						before.tipAccelerationG.loaded + slack(before.tipAccelerationG.loaded)
					);
					expect(after.restraint.requiredN).toBeGreaterThanOrEqual(
						before.restraint.requiredN - slack(before.restraint.requiredN)
					);
					// and the same contents stacked high are never steadier than stacked low
					expect(before.tipAccelerationG.contentsHigh).toBeLessThanOrEqual(
						before.tipAccelerationG.contentsLow + slack(before.tipAccelerationG.contentsLow)
					);
				}
			),
			{ numRuns: 300 }
		);
	});

	it('an anchored case’s required restraint force is never negative, and every output is finite', () => {
		fc.assert(
			fc.property(caseArb, (c) => {
				const r = checkStabilitySI(toRequest(c));
				expect(r.restraint.requiredN).toBeGreaterThanOrEqual(0);
				expect(r.restraint.recommendedRatingN).toBeGreaterThanOrEqual(
					r.restraint.f3096TestN.edition2023
				);
				expect(allFinite(r)).toEqual([]);
				expect(r.cautions.length).toBeGreaterThan(0);
			}),
			{ numRuns: 300 }
		);
	});

	it('invalid input gives a clear error naming the field', () => {
		fc.assert(
			fc.property(fc.constantFrom(0, -0.5, NaN, Infinity), (bad) => {
				const base = toRequest({
					heightM: 2,
					widthM: 1,
					depthM: 0.4,
					massKg: 50,
					setbackFrac: 0,
					tiltDeg: 0,
					shelves: [],
					drawers: []
				});
				expect(() => checkStabilitySI({ ...base, heightM: bad })).toThrow(/^heightM: expected/);
				expect(() => checkStabilitySI({ ...base, depthM: bad })).toThrow(/^depthM: expected/);
				expect(() => checkStabilitySI({ ...base, construction: { massKg: bad } })).toThrow(
					/construction.massKg/
				);
			})
		);
		expect(() =>
			checkStabilitySI({
				...toRequest({
					heightM: 2,
					widthM: 1,
					depthM: 0.4,
					massKg: 50,
					setbackFrac: 0,
					tiltDeg: 0,
					shelves: [],
					drawers: []
				}),
				floorTiltDeg: 30
			})
		).toThrow(/floorTiltDeg/);
	});
});
