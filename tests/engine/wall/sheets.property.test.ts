import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CutGroup } from '../../../src/lib/engine/cutlist';
import { DEFAULT_SHEET_OPTIONS, planSheets } from '../../../src/lib/engine/sheets';
import { isGuillotine, smallestGap } from '../../../src/lib/engine/sheets/guillotine';
import { DEMO_WALL } from '../../../src/lib/engine/wall';
import { wallSheets } from '../../../src/lib/engine/wall';

const IN = 0.0254;

function group(
	i: number,
	l: number,
	w: number,
	count: number,
	locked: boolean,
	material = 'mdo'
): CutGroup {
	return {
		mark: `P${i}`,
		role: 'side',
		name: 'part',
		count,
		lengthM: l,
		widthM: w,
		thicknessM: 0.75 * IN,
		roughLengthM: l,
		roughWidthM: w,
		material,
		materialName: material,
		grain: locked ? 'length' : 'any',
		grainReason: locked ? 'strength' : undefined,
		banding: { long: 0, short: 0 },
		bandingM: 0,
		machining: [],
		cases: [0],
		parts: []
	};
}

const groupsArb = fc.array(
	fc.record({
		l: fc.double({ min: 2 * IN, max: 100 * IN, noNaN: true }),
		w: fc.double({ min: 1 * IN, max: 50 * IN, noNaN: true }),
		count: fc.integer({ min: 1, max: 6 }),
		locked: fc.boolean(),
		material: fc.constantFrom('mdo', 'birch-multiply')
	}),
	{ minLength: 1, maxLength: 14 }
);

const optionsArb = fc.record({
	kerf: fc.double({ min: 0, max: 0.25 * IN, noNaN: true }),
	trim: fc.double({ min: 0, max: 0.5 * IN, noNaN: true }),
	length: fc.constantFrom(96 * IN, 120 * IN, 60 * IN),
	width: fc.constantFrom(48 * IN, 60 * IN, 30 * IN)
});

describe('sheet layouts (property tests)', () => {
	it('no part overlaps another or leaves its sheet less the trim; the kerf lies between every pair; cuts are edge to edge; grain-locked parts never turn; every part is placed or reported', () => {
		fc.assert(
			fc.property(groupsArb, optionsArb, (raw, o) => {
				const groups = raw.map((g, i) => group(i, g.l, g.w, g.count, g.locked, g.material));
				const plan = planSheets(groups, () => false, {
					...DEFAULT_SHEET_OPTIONS,
					kerfM: o.kerf,
					trimM: o.trim,
					defaultStock: { lengthM: o.length, widthM: o.width, keepGrain: false }
				});
				let placed = 0;
				for (const s of plan.sheets) {
					for (const p of s.placements) {
						expect(p.xM).toBeGreaterThanOrEqual(o.trim - 1e-6);
						expect(p.yM).toBeGreaterThanOrEqual(o.trim - 1e-6);
						expect(p.xM + p.wM).toBeLessThanOrEqual(o.length - o.trim + 1e-6);
						expect(p.yM + p.hM).toBeLessThanOrEqual(o.width - o.trim + 1e-6);
						const g = groups[p.group];
						if (g.grainReason === 'strength') expect(p.turned).toBe(false);
						// placed at its rough size (to the micrometre, rounded up)
						const [a, b] = p.turned ? [p.hM, p.wM] : [p.wM, p.hM];
						expect(a).toBeGreaterThanOrEqual(g.roughLengthM - 1e-9);
						expect(a).toBeLessThan(g.roughLengthM + 2e-6);
						expect(b).toBeGreaterThanOrEqual(g.roughWidthM - 1e-9);
					}
					if (s.placements.length > 1)
						expect(smallestGap(s.placements)).toBeGreaterThanOrEqual(o.kerf - 2e-6);
					expect(isGuillotine(s.placements)).toBe(true);
					placed += s.placements.length;
				}
				const reported = plan.notOnSheets.reduce((a, n) => a + n.count, 0);
				expect(placed + reported).toBe(groups.reduce((a, g) => a + g.count, 0));
				for (const m of plan.perMaterial) {
					// sheet count at least the parts' area over one sheet's area, and at least the
					// bound from parts too wide to lie three across
					expect(m.sheets).toBeGreaterThanOrEqual(m.lowerBound);
					expect(m.lowerBound).toBeGreaterThanOrEqual(m.areaBound);
					expect(m.yield).toBeLessThanOrEqual(1);
					// never more sheets than parts on them (every sheet holds at least one)
					const onIt = plan.sheets
						.filter((s) => s.materialName === m.materialName)
						.reduce((a, s) => a + s.placements.length, 0);
					expect(m.sheets).toBeLessThanOrEqual(onIt);
				}
			}),
			{ numRuns: 150 }
		);
	});

	it('small parts: never more sheets than 8/3 of their area (kerf included) plus one', () => {
		// Parts at most a quarter of the sheet each way, grain locked (one way to lie), taken tallest
		// first: a strip is closed only when a part no taller than any in it cannot fit, so its
		// stacks cover more than three quarters of the sheet's length with parts at least as tall
		// as the next strip; a sheet is closed only when less than a quarter of its width is left.
		// Every sheet but the last is therefore more than 3/8 full.
		fc.assert(
			fc.property(
				fc.array(
					fc.record({
						l: fc.double({ min: 1 * IN, max: 22 * IN, noNaN: true }),
						w: fc.double({ min: 1 * IN, max: 10 * IN, noNaN: true }),
						count: fc.integer({ min: 1, max: 12 })
					}),
					{ minLength: 1, maxLength: 12 }
				),
				fc.double({ min: 0, max: 0.125 * IN, noNaN: true }),
				(raw, kerf) => {
					const groups = raw.map((g, i) => group(i, g.l, g.w, g.count, true));
					const plan = planSheets(groups, () => false, {
						...DEFAULT_SHEET_OPTIONS,
						kerfM: kerf,
						trimM: 0,
						defaultStock: { lengthM: 96 * IN, widthM: 48 * IN, keepGrain: false }
					});
					const [m] = plan.perMaterial;
					const area = groups.reduce(
						(a, g) => a + g.count * (g.roughLengthM + kerf) * (g.roughWidthM + kerf),
						0
					);
					const sheet = (96 * IN + kerf) * (48 * IN + kerf);
					expect(m.sheets).toBeLessThanOrEqual(Math.ceil(((8 / 3) * area) / sheet) + 1);
				}
			),
			{ numRuns: 150 }
		);
	});

	it('the guillotine check refuses a pinwheel, which no edge-to-edge cut can separate', () => {
		const pinwheel = [
			{ xM: 0, yM: 0, wM: 2, hM: 1 },
			{ xM: 2, yM: 0, wM: 1, hM: 2 },
			{ xM: 1, yM: 2, wM: 2, hM: 1 },
			{ xM: 0, yM: 1, wM: 1, hM: 2 },
			{ xM: 1, yM: 1, wM: 1, hM: 1 }
		];
		expect(isGuillotine(pinwheel)).toBe(false);
		expect(isGuillotine(pinwheel.slice(0, 2))).toBe(true);
	});
});

describe('sheet layouts of the demo wall', () => {
	const { cutList, sheets } = wallSheets(DEMO_WALL);
	it('the demo’s MDO: 6 sheets, within one of the lower bound (5: its 22 panels 17" wide cannot lie three across a 48" sheet; the area alone says 4)', () => {
		const mdo = sheets.perMaterial.find((m) => m.materialName.startsWith('MDO'))!;
		expect(mdo.areaBound).toBe(4);
		expect(mdo.lowerBound).toBe(5);
		expect(mdo.sheets).toBeLessThanOrEqual(mdo.lowerBound + 1);
		// parts stacked within a strip: some crosscut frees a stack of several parts
		expect(
			sheets.sheets.some((s) =>
				s.cuts.some((c) => c.kind === 'crosscut' && (c.marks?.length ?? 0) > 1)
			)
		).toBe(true);
	});
	it('sheets per material at least the area bound, every part on a sheet, cut order rips before crosscuts in each strip', () => {
		for (const m of sheets.perMaterial) {
			const area = sheets.sheets
				.filter((s) => s.materialName === m.materialName)
				.flatMap((s) => s.placements)
				.reduce((a, p) => a + p.wM * p.hM, 0);
			expect(m.sheets).toBeGreaterThanOrEqual(Math.ceil(area / (m.lengthM * m.widthM)));
		}
		expect(sheets.notOnSheets).toEqual([]);
		const onSheets = sheets.sheets.reduce((a, s) => a + s.placements.length, 0);
		expect(onSheets).toBe(cutList.groups.reduce((a, g) => a + g.count, 0));
		for (const s of sheets.sheets) {
			const kinds = s.cuts.map((c) => c.kind);
			expect(kinds.slice(0, 4)).toEqual(['trim', 'trim', 'trim', 'trim']);
			// a strip is ripped off before any part of it is crosscut
			s.cuts.forEach((c, i) => {
				if (c.kind === 'crosscut')
					expect(
						s.cuts.findIndex((x) => x.kind === 'rip-strip' && x.strip === c.strip)
					).toBeLessThan(i);
			});
		}
	});
	it('with grain kept for looks on the face material, no MDO part turns; veneered birch keeps it by default', () => {
		const kept = wallSheets(DEMO_WALL, {
			kerfM: IN / 8,
			trimM: IN / 4,
			stocks: [{ material: 'mdo', lengthM: 96 * IN, widthM: 48 * IN, keepGrain: true }]
		});
		const mdo = kept.sheets.sheets.filter((s) => s.materialName.startsWith('MDO'));
		expect(mdo.length).toBeGreaterThan(0);
		expect(mdo.flatMap((s) => s.placements).every((p) => !p.turned)).toBe(true);
		const stock = (name: string) =>
			sheets.options.stocks.find((s) => s.materialName.startsWith(name))!;
		expect(stock('Birch').keepGrain).toBe(true);
		expect(stock('MDO').keepGrain).toBe(false);
	});
});
