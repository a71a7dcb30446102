import {
	EN14749_HORIZONTAL_N,
	EN14749_MIN_HEIGHT_M,
	EN14749_OPEN_UNLOADED_VERTICAL_N,
	EN14749_TALL_HEIGHT_M,
	EN14749_VERTICAL_N,
	F2057_MIN_HEIGHT_M,
	F2057_TEST_WEIGHT_N,
	F3096_14_PULL_N,
	F3096_23_PULL_N
} from '../../../../reference/tipping';
import { InputError } from '../errors';
import { nonNegative, positive } from '../joinery/validate';
import { anchoringAdvice } from './anchoring';
import { STABILITY_CAUTIONS } from './cautions';
import { casePoints, contentsPoints, drawerExtension, frontPoints, rearranged } from './points';
import {
	centreOf,
	horizontalLever,
	restoringMoment,
	restraintLever,
	tipAccelerationG,
	tipForceAtTop,
	verticalLever,
	type Frame,
	type MassPoint
} from './statics';
import type { FrontEdgeLoad, StabilityRequest, StabilityResult, StandardComparison } from './types';

const MAX_TILT_DEG = 15;

interface EdgePlace {
	where: string;
	xM: number;
	zM: number;
}

/**
 * Tip-over of a case by statics: centre of gravity, the forces that tip it, the front-edge load
 * against the ASTM F2057-23 test weight, EN 14749 forces, and the pull a wall restraint must hold.
 * An estimate for planning; the cautions always come with it.
 */
export function checkStabilitySI(req: StabilityRequest): StabilityResult {
	const heightM = positive(req.heightM, 'heightM');
	positive(req.widthM, 'widthM');
	const depthM = positive(req.depthM, 'depthM');
	const setback = nonNegative(req.base?.setbackM ?? 0, 'base.setbackM');
	if (setback >= depthM) throw InputError.at('base.setbackM', 'expected less than the case depth');
	const tiltDeg = nonNegative(req.floorTiltDeg ?? 0, 'floorTiltDeg');
	if (tiltDeg > MAX_TILT_DEG)
		throw InputError.at('floorTiltDeg', `expected at most ${MAX_TILT_DEG}°`);
	const f: Frame = { pivotXM: setback, tiltRad: (tiltDeg * Math.PI) / 180 };

	const body = casePoints(req);
	const goods = contentsPoints(req);
	const shut = (loaded: boolean) => frontPoints(req, false, loaded);
	const open = (loaded: boolean) => frontPoints(req, true, loaded);
	const empty = [...body, ...shut(false)];
	const loaded = [...body, ...shut(true), ...goods];
	const low = [...body, ...shut(true), ...rearranged(goods, 'low')];
	const high = [...body, ...shut(true), ...rearranged(goods, 'high')];
	const openEmpty = [...body, ...open(false)];
	const openLoaded = [...body, ...open(true), ...goods];

	const places = edgePlaces(req);
	const frontEdgeLoads = places.map((p) => frontEdge(p, openEmpty, openLoaded, f));
	const worst = worstPlace(places, f);
	const standards = compare(req, openEmpty, worst, f);

	// The restraint's worst case here: everything open and loaded, or open and empty, with the F2057
	// test weight on the front edge that has the longest lever.
	const zA = req.anchoring?.heightM ?? heightM;
	if (!Number.isFinite(zA) || zA <= 0 || zA > heightM)
		throw InputError.at('anchoring.heightM', 'expected a height within the case');
	const weightMoment = worst
		? F2057_TEST_WEIGHT_N * Math.max(0, verticalLever(worst.xM, worst.zM, f))
		: 0;
	const need = (pts: MassPoint[]) =>
		Math.max(0, (weightMoment - restoringMoment(pts, f)) / restraintLever(zA, depthM, f));
	const requiredN = Math.max(need(openEmpty), need(openLoaded));
	const anchored = (req.anchoring?.kind ?? 'none') !== 'none';
	const tipsUnaided = restoringMoment(openEmpty, f) <= 0 || restoringMoment(openLoaded, f) <= 0;
	const advice = anchoringAdvice(req, requiredN);

	const warnings: string[] = [];
	if (tipsUnaided)
		warnings.push(
			'With its drawers and doors open the case tips over by itself: it must be anchored.'
		);
	if (frontEdgeLoads.some((l) => !l.passF2057))
		warnings.push(
			'A weight of less than the 60 lb ASTM F2057-23 test weight on a front edge tips it.'
		);
	if (advice.required && !anchored) warnings.push('This case should be anchored to the wall.');
	if (anchored && req.anchoring?.intoStuds === false)
		warnings.push(
			'A restraint fixed into drywall alone pulls out (FEMA): fix it into a stud or blocking.'
		);
	if (tiltDeg > 0)
		warnings.push(
			`A forward floor tilt of ${Number(tiltDeg.toFixed(2))}° is included; carpet and shims change it.`
		);

	return {
		estimate: true,
		centreOfGravity: { empty: centreOf(empty), loaded: centreOf(loaded) },
		tipForceAtTopN: {
			empty: tipForceAtTop(empty, heightM, f),
			loaded: tipForceAtTop(loaded, heightM, f),
			contentsLow: tipForceAtTop(low, heightM, f),
			contentsHigh: tipForceAtTop(high, heightM, f)
		},
		tipAccelerationG: {
			empty: tipAccelerationG(empty, f),
			loaded: tipAccelerationG(loaded, f),
			contentsLow: tipAccelerationG(low, f),
			contentsHigh: tipAccelerationG(high, f)
		},
		tipsUnaided,
		frontEdgeLoads,
		standards,
		restraint: {
			requiredN,
			scenario: worst
				? `everything open, 60 lb (ASTM F2057-23 test weight) on ${worst.where}, empty and loaded`
				: 'everything open, empty and loaded',
			f3096TestN: { edition2014: F3096_14_PULL_N, edition2023: F3096_23_PULL_N },
			recommendedRatingN: Math.max(requiredN, F3096_23_PULL_N),
			anchored,
			adequate: anchored && req.anchoring?.intoStuds !== false
		},
		anchoring: advice,
		warnings,
		cautions: STABILITY_CAUTIONS,
		sources: [
			'Statics of a rigid body about its front tipping line',
			'ASTM F2057-23 (clothing storage units; nearest published test, not a requirement for shelving)',
			'ASTM F3096-14 / F3096-23 tip restraint pull (unverified)',
			'EN 14749:2016 stability forces (from a test-lab report; clauses unverified)',
			'FEMA, Anchor Tall Bookcases and File Cabinets (2008); FEMA E-74 §6.5.2'
		]
	};
}

/** Where a child or a heavy box may bear on a front edge: each open drawer, each shelf, the top. */
function edgePlaces(req: StabilityRequest): EdgePlace[] {
	const out: EdgePlace[] = (req.drawers ?? []).map((d, i) => ({
		where: `drawer ${i + 1} pulled out`,
		xM: -drawerExtension(req, i),
		zM: d.heightM
	}));
	const shelfHeights = [...new Set((req.contents ?? []).map((c) => c.heightM))].sort(
		(a, b) => a - b
	);
	shelfHeights.forEach((z) => out.push({ where: `the shelf at ${z.toFixed(3)} m`, xM: 0, zM: z }));
	out.push({ where: 'the top', xM: 0, zM: req.heightM });
	return out;
}

function frontEdge(
	p: EdgePlace,
	openEmpty: MassPoint[],
	openLoaded: MassPoint[],
	f: Frame
): FrontEdgeLoad {
	const lever = verticalLever(p.xM, p.zM, f);
	const load = (pts: MassPoint[]) =>
		lever > 1e-9 ? Math.max(0, restoringMoment(pts, f)) / lever : null;
	const e = load(openEmpty);
	const l = load(openLoaded);
	const least = e === null ? l : l === null ? e : Math.min(e, l);
	return {
		where: p.where,
		heightM: p.zM,
		leverM: Math.max(0, lever),
		tipLoadEmptyN: e,
		tipLoadLoadedN: l,
		marginToF2057: least === null ? null : least / F2057_TEST_WEIGHT_N,
		passF2057: least === null || least >= F2057_TEST_WEIGHT_N
	};
}

/** The front edge where a vertical load has the longest lever; the top when none has a lever (the
 * test forces' horizontal part still acts there). */
function worstPlace(places: EdgePlace[], f: Frame): EdgePlace {
	let best: EdgePlace = places[places.length - 1];
	let bestLever = 1e-9;
	for (const p of places) {
		const lever = verticalLever(p.xM, p.zM, f);
		if (lever > bestLever) {
			best = p;
			bestLever = lever;
		}
	}
	return best;
}

function compare(
	req: StabilityRequest,
	openEmpty: MassPoint[],
	worst: EdgePlace | null,
	f: Frame
): StandardComparison[] {
	const mr = Math.max(0, restoringMoment(openEmpty, f));
	const vLever = worst ? Math.max(0, verticalLever(worst.xM, worst.zM, f)) : 0;
	const hLever = worst ? Math.max(0, horizontalLever(worst.zM, f)) : 0;
	const margin = (m: number) => (m > 1e-9 ? mr / m : null);
	const at = worst ? `on ${worst.where}` : 'at the front edge';
	const tall = margin(EN14749_VERTICAL_N * vLever + EN14749_HORIZONTAL_N * hLever);
	const light = margin(EN14749_OPEN_UNLOADED_VERTICAL_N * vLever);
	const f2057 = margin(F2057_TEST_WEIGHT_N * vLever);
	return [
		{
			name: 'ASTM F2057-23, 60 lb on an open drawer',
			applies: req.heightM >= F2057_MIN_HEIGHT_M,
			note: `Nearest published test (it covers clothing storage units, not bookcases); 60 lb ${at}, empty, everything open.`,
			margin: f2057,
			pass: f2057 === null || f2057 >= 1
		},
		{
			name: 'EN 14749:2016, 350 N down and 50 N out',
			applies: req.heightM > EN14749_TALL_HEIGHT_M,
			note: `For units over 1000 mm tall, forces ${at}, empty, everything open (clause unverified).`,
			margin: tall,
			pass: tall === null || tall >= 1
		},
		{
			name: 'EN 14749:2016, 100 N down, open and unloaded',
			applies: req.heightM >= EN14749_MIN_HEIGHT_M,
			note: `100 N ${at}, empty, everything open (clause unverified).`,
			margin: light,
			pass: light === null || light >= 1
		}
	];
}
