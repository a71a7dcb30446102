import { describe, expect, it } from 'vitest';
import { checkStabilitySI, type StabilityRequest } from '../../src/lib/engine/stability';
import { checkStability } from '../../src/lib/compute';
import { InputError } from '../../src/lib/engine';

const IN = 0.0254;
const LBF = 4.4482216152605;
const LB = 0.45359237;

/**
 * A bookcase of about 80" height and 17" depth (common practice), 36" wide, weighing 100 lb with its
 * centre of gravity at mid-height and mid-depth. Worked by statics about the front tipping line.
 */
const bookcase = (over: Partial<StabilityRequest> = {}): StabilityRequest => ({
	heightM: 80 * IN,
	widthM: 36 * IN,
	depthM: 17 * IN,
	construction: { massKg: 100 * LB },
	...over
});

describe('tip-over of an 80" × 17" bookcase, worked by hand', () => {
	it('empty: the top force that tips it is W · (d/2) / H', () => {
		// 100 lbf · 8.5" / 80" = 10.625 lbf
		const r = checkStabilitySI(bookcase());
		expect(r.tipForceAtTopN.empty / LBF).toBeCloseTo(10.625, 9);
		expect(r.centreOfGravity.empty.heightM / IN).toBeCloseTo(40, 9);
		expect(r.estimate).toBe(true);
	});

	it('loaded with 5 shelves of 30 lb at mid-depth: 250 lbf · 8.5" / 80" = 26.5625 lbf', () => {
		const contents = [10, 25, 40, 55, 70].map((h) => ({ massKg: 30 * LB, heightM: h * IN }));
		const r = checkStabilitySI(bookcase({ contents }));
		expect(r.tipForceAtTopN.loaded / LBF).toBeCloseTo(26.5625, 9);
		// with a level floor the height of the contents does not change the top force …
		expect(r.tipForceAtTopN.contentsHigh).toBeCloseTo(r.tipForceAtTopN.contentsLow, 9);
	});

	it('a 3" set-back plinth: arm 8.5 − 3 = 5.5", so 100 · 5.5 / 80 = 6.875 lbf; 550 lb·in / 3" = 183.3 lb on the top front edge', () => {
		const r = checkStabilitySI(bookcase({ base: { setbackM: 3 * IN } }));
		expect(r.tipForceAtTopN.empty / LBF).toBeCloseTo(6.875, 9);
		const top = r.frontEdgeLoads.find((l) => l.where === 'the top')!;
		expect(top.tipLoadEmptyN! / LBF).toBeCloseTo(550 / 3, 9);
		expect(top.passF2057).toBe(true);
		expect(top.marginToF2057).toBeCloseTo(550 / 3 / 60, 9);
	});

	it('a 2° forward tilt: M = 100 · (8.5 cos 2° − 40 sin 2°) = 709.88 lb·in over 80 cos 2° = 79.951" → 8.879 lbf', () => {
		const r = checkStabilitySI(bookcase({ floorTiltDeg: 2 }));
		expect(r.tipForceAtTopN.empty / LBF).toBeCloseTo(8.87895, 4);
		expect(r.warnings.join(' ')).toMatch(/tilt/);
	});

	it('an open drawer: the 60 lb F2057-23 test weight tips it, and the restraint pull is found', () => {
		// Drawer at 30", 15 lb box + 20 lb contents, opening 14". All open, empty:
		// M_r = 100 · 8.5 + 15 · (8.5 − 14) = 767.5 lb·in → tip load on its front 767.5 / 14 = 54.82 lb < 60
		// loaded: M_r = 850 + 35 · (−5.5) = 657.5 lb·in → 46.96 lb
		// restraint at the top back, lever 80": T = (60 · 14 − 657.5) / 80 = 2.28125 lbf
		const r = checkStabilitySI(
			bookcase({
				drawers: [{ heightM: 30 * IN, massKg: 15 * LB, contentsKg: 20 * LB, extensionM: 14 * IN }]
			})
		);
		const drawer = r.frontEdgeLoads[0];
		expect(drawer.tipLoadEmptyN! / LBF).toBeCloseTo(767.5 / 14, 9);
		expect(drawer.tipLoadLoadedN! / LBF).toBeCloseTo(657.5 / 14, 9);
		expect(drawer.passF2057).toBe(false);
		expect(r.restraint.requiredN / LBF).toBeCloseTo(2.28125, 9);
		expect(r.warnings.join(' ')).toMatch(/60 lb/);
	});

	it('EN 14749 forces on the open drawer (clauses unverified), worked by hand', () => {
		// M_r (empty, open) = 767.5 lb·in = 86.72 N·m. 350 N down at 14" (0.3556 m) in front of the tipping
		// line plus 50 N outward at 30" (0.762 m): 124.46 + 38.10 = 162.56 N·m → margin 0.5335.
		// 100 N down, open and unloaded: 35.56 N·m → margin 2.439.
		const r = checkStabilitySI(
			bookcase({
				drawers: [{ heightM: 30 * IN, massKg: 15 * LB, contentsKg: 20 * LB, extensionM: 14 * IN }]
			})
		);
		const mr = 767.5 * LBF * IN;
		const [f2057, tall, light] = r.standards;
		expect(tall.margin).toBeCloseTo(mr / (350 * 14 * IN + 50 * 30 * IN), 9);
		expect(tall.margin).toBeCloseTo(0.5335, 3);
		expect(tall.pass).toBe(false);
		expect(light.margin).toBeCloseTo(mr / (100 * 14 * IN), 9);
		expect(light.pass).toBe(true);
		expect(f2057.margin).toBeCloseTo(767.5 / (60 * 14), 9);
	});

	it('no drawers and no set-back: the EN 14749 50 N outward force acts at the top', () => {
		// M_r = 100 lbf · 8.5" = 96.04 N·m against 50 N · 80" (2.032 m) = 101.6 N·m → margin 0.9453:
		// a light 80" bookcase fails it unanchored. A vertical load on a front edge has no lever here.
		const r = checkStabilitySI(bookcase());
		const tall = r.standards[1];
		expect(tall.margin).toBeCloseTo((100 * LBF * 8.5 * IN) / (50 * 80 * IN), 9);
		expect(tall.pass).toBe(false);
		expect(r.standards[0].margin).toBeNull();
	});

	it('the restraint recommendation is at least the ASTM F3096 test pull (50 lbf 2014, 60 lbf 2023)', () => {
		const r = checkStabilitySI(bookcase());
		expect(r.restraint.f3096TestN.edition2014 / LBF).toBeCloseTo(50, 9);
		expect(r.restraint.f3096TestN.edition2023 / LBF).toBeCloseTo(60, 9);
		expect(r.restraint.requiredN).toBe(0);
		expect(r.restraint.recommendedRatingN / LBF).toBeCloseTo(60, 9);
		expect(r.anchoring.required).toBe(true);
		expect(r.anchoring.recommendations.join(' ')).toMatch(/studs/);
		expect(r.anchoring.recommendations.join(' ')).toMatch(/drywall/);
	});

	it('a case that tips by itself with its drawers open is flagged, and seismic advice cites FEMA E-74', () => {
		const r = checkStabilitySI(
			bookcase({
				construction: { massKg: 20 * LB },
				drawers: [{ heightM: 60 * IN, massKg: 40 * LB, extensionM: 16 * IN }],
				seismicRegion: true
			})
		);
		// empty, open: 20 · 8.5 + 40 · (8.5 − 16) = 170 − 300 < 0
		expect(r.tipsUnaided).toBe(true);
		expect(r.anchoring.recommendations.join(' ')).toMatch(/E-74/);
	});

	it('the cautions always come with the result', () => {
		const r = checkStabilitySI(bookcase());
		expect(r.cautions.join(' ')).toMatch(/Anchor every tall case/);
		expect(r.cautions.join(' ')).toMatch(/heavy items/i);
		expect(r.cautions.join(' ')).toMatch(/local building codes/);
	});
});

describe('stability requests', () => {
	it('takes quantity strings like the shelf engine (weights as forces)', () => {
		const r = checkStability({
			height: '80"',
			width: '36"',
			depth: '17"',
			construction: { weight: '100 lb' },
			contents: [{ weight: '60 lbf', height: '5\' 10"' }]
		});
		expect(r.tipForceAtTopN.loaded / LBF).toBeCloseTo((160 * 8.5) / 80, 6);
	});

	it('names the bad field', () => {
		expect(() => checkStabilitySI(bookcase({ base: { setbackM: 20 * IN } }))).toThrow(
			/base.setbackM/
		);
		try {
			checkStability({
				height: 'tall',
				width: '36"',
				depth: '17"',
				construction: { weight: '100 lb' }
			});
			expect.unreachable();
		} catch (e) {
			expect(e).toBeInstanceOf(InputError);
			expect((e as InputError).issues[0].path).toEqual(['height']);
		}
	});
});
