/**
 * Every piece of one case of the wall, where it stands and what it needs: the cut list, the weights
 * for the tip-over check and the elevation all start here.
 */
import { ADJUSTABLE_CLEARANCE_M, densityOf, materialName } from '../case/geometry';
import { formatLength } from '../units/length';
import { hasGrain, needsBanding, shelfSpans, type WallCaseGeometry } from './geometry';
import type {
	DoorOpeningDesign,
	DrawerOpeningDesign,
	Material,
	PartRole,
	WallCaseDesign,
	WallPart
} from './types';
import { METRES_PER_INCH } from '../units/length';

const INCH = METRES_PER_INCH;
/** An anchor strip (nailer) under the top at the back, 3" wide (common practice, no source). */
const ANCHOR_STRIP_WIDTH_M = 3 * INCH;
const len = (m: number) => formatLength(m, { unit: 'frac16' });

/** Parts that carry load keep their grain along their length; faces keep it for looks. */
const STRENGTH_ROLES = new Set<PartRole>([
	'top',
	'bottom',
	'fixed shelf',
	'adjustable shelf',
	'nosing',
	// a divider carries the shelves on both sides in compression: grain along its height
	'divider'
]);

export interface PartSink {
	add(p: Omit<WallPart, 'materialName' | 'grain' | 'grainReason' | 'massKg'>): WallPart;
}

export function partSink(out: WallPart[]): PartSink {
	return {
		add(p) {
			const grainy = hasGrain(p.material);
			const part: WallPart = {
				...p,
				materialName: materialName(p.material),
				grain: grainy ? 'length' : 'any',
				grainReason: grainy ? (STRENGTH_ROLES.has(p.role) ? 'strength' : 'looks') : undefined,
				massKg: p.lengthM * p.widthM * p.thicknessM * densityOf(p.material)
			};
			out.push(part);
			return part;
		}
	};
}

/** Opening width for fronts: the face-frame opening in a case of one bay, else the bay's width. */
function openingWidth(c: WallCaseDesign, g: WallCaseGeometry, bay: number | undefined) {
	const b = g.bays[bay ?? 0];
	if (c.faceFrame && g.bays.length === 1)
		return { xM: c.faceFrame.stileWidth, widthM: c.width - 2 * c.faceFrame.stileWidth };
	return b;
}

export function caseParts(
	c: WallCaseDesign,
	ci: number,
	xCase: number,
	g: WallCaseGeometry,
	touches: { left: boolean; right: boolean },
	sink: PartSink
): void {
	const at = ['cases', ci];
	const where = `cases.${ci}`;
	const frame = c.faceFrame;
	const f = g.frameM;
	const side = c.sides;
	const bandFront = (m: Material) => (!frame && needsBanding(m) ? 1 : 0);
	const dado = (joint: string) => (joint === 'dado' ? 2 * g.dadoDepthM : 0);
	const dadoNote = (what: string, joint: string) =>
		joint === 'dado' ? [`dados ${len(g.dadoDepthM)} deep in the sides for the ${what}`] : [];

	// sides
	const sideMachining = [
		...(c.back?.fitted === 'rabbet'
			? [
					`rabbet ${len(c.back.thickness)} wide × ${len(side.thickness / 2)} deep along the back inside edge for the back`
				]
			: []),
		...c.shelves
			.filter((s) => s.kind === 'fixed' && s.joint === 'dado' && s.bay === undefined)
			.map(() => 'dado for a fixed shelf'),
		...(c.top.joint === 'dado' ? ['dado for the top'] : []),
		...(c.bottom.joint === 'dado' ? ['dado for the bottom'] : []),
		...(c.shelves.some((s) => s.kind === 'adjustable') ? ['shelf-pin holes'] : [])
	];
	for (const [i, name] of (['left', 'right'] as const).entries()) {
		sink.add({
			caseIndex: ci,
			role: 'side',
			name: `${name} side`,
			path: [...at, 'sides'],
			lengthM: g.sideLengthM,
			widthM: g.sideDepthM,
			thicknessM: side.thickness,
			material: side.material,
			banding: { long: bandFront(side.material), short: 0 },
			// a side against its neighbour hides its outer face: any face grade will do
			machining: touches[name]
				? [...sideMachining, 'outer face hidden against the next case: no finished face needed']
				: sideMachining,
			touches: touches[name] ? name : undefined,
			elevation: frame
				? undefined
				: {
						x: xCase + i * (c.width - side.thickness),
						z: c.height - g.sideLengthM,
						w: side.thickness,
						h: g.sideLengthM
					},
			centre: { heightM: c.height - g.sideLengthM / 2, fromFrontM: f + g.sideDepthM / 2 }
		});
	}

	// top and bottom
	for (const key of ['top', 'bottom'] as const) {
		const p = c[key];
		const t = key === 'top' ? g.topM : g.bottomM;
		const m = p.material ?? side.material;
		const z = key === 'top' ? g.topUndersideM : g.boxBottomM;
		sink.add({
			caseIndex: ci,
			role: key,
			name: key,
			path: [...at, key],
			lengthM: g.innerWidthM + dado(p.joint),
			widthM: g.insideDepthM,
			thicknessM: t,
			material: m,
			banding: { long: bandFront(m), short: 0 },
			machining: dadoNote(key, p.joint),
			elevation: frame ? undefined : { x: xCase + g.sideM, z, w: g.innerWidthM, h: t },
			centre: { heightM: z + t / 2, fromFrontM: g.insideCentreXM }
		});
	}

	// shelves
	c.shelves.forEach((s, si) => {
		const t = s.thickness ?? side.thickness;
		const m = s.material ?? side.material;
		const nose = s.nosing?.thickness ?? 0;
		const span = shelfSpans(g, s.bay, s.height - t, s.height, `${where}.shelves.${si}`);
		const clear = span.spans.reduce((a, b) => a + b, 0);
		const adjustable = s.kind === 'adjustable';
		const length = adjustable ? clear - ADJUSTABLE_CLEARANCE_M : clear + dado(s.joint);
		const label = s.name ?? `shelf ${si + 1}`;
		sink.add({
			caseIndex: ci,
			role: adjustable ? 'adjustable shelf' : 'fixed shelf',
			name: span.bay === null ? label : `${label} (bay ${span.bay + 1})`,
			path: [...at, 'shelves', si],
			lengthM: length,
			widthM: g.insideDepthM - nose,
			thicknessM: t,
			material: m,
			banding: { long: s.nosing ? 0 : adjustable && needsBanding(m) ? 1 : bandFront(m), short: 0 },
			machining: adjustable ? [] : dadoNote('shelf', s.joint),
			elevation: { x: xCase + span.xM, z: s.height - t, w: clear, h: t },
			centre: { heightM: s.height - t / 2, fromFrontM: f + nose + (g.insideDepthM - nose) / 2 }
		});
		if (s.nosing)
			sink.add({
				caseIndex: ci,
				role: 'nosing',
				name: `${label} nosing`,
				path: [...at, 'shelves', si, 'nosing'],
				lengthM: length,
				widthM: s.nosing.height,
				thicknessM: s.nosing.thickness,
				material: s.nosing.material,
				banding: { long: 0, short: 0 },
				machining: [],
				centre: { heightM: s.height - s.nosing.height / 2, fromFrontM: f + nose / 2 }
			});
	});

	// dividers
	for (const dv of g.dividers) {
		const m = dv.design.material ?? side.material;
		const joint = dv.design.joint;
		const h = dv.topM - dv.bottomM;
		sink.add({
			caseIndex: ci,
			role: 'divider',
			name: dv.design.name ?? `divider ${dv.index + 1}`,
			path: [...at, 'dividers', dv.index],
			lengthM: h + dado(joint),
			widthM: g.insideDepthM,
			thicknessM: dv.thicknessM,
			material: m,
			banding: { long: bandFront(m), short: 0 },
			machining:
				joint === 'dado' ? [`dados ${len(g.dadoDepthM)} deep above and below for its ends`] : [],
			elevation: { x: xCase + dv.xM - dv.thicknessM / 2, z: dv.bottomM, w: dv.thicknessM, h },
			centre: { heightM: dv.bottomM + h / 2, fromFrontM: g.insideCentreXM }
		});
	}

	// back
	if (c.back) {
		const rabbet = c.back.fitted === 'rabbet';
		sink.add({
			caseIndex: ci,
			role: 'back',
			name: 'back',
			path: [...at, 'back'],
			lengthM: g.sideLengthM,
			widthM: rabbet ? g.innerWidthM + side.thickness : c.width,
			thicknessM: c.back.thickness,
			material: c.back.material,
			banding: { long: 0, short: 0 },
			machining: rabbet ? ['fits the rabbets in the sides'] : [],
			centre: { heightM: c.height - g.sideLengthM / 2, fromFrontM: c.depth - c.back.thickness / 2 }
		});
	}

	// anchor strip
	if (c.anchoring && c.anchoring.kind !== 'none') {
		sink.add({
			caseIndex: ci,
			role: 'anchor strip',
			name: 'anchor strip',
			path: [...at, 'anchoring'],
			lengthM: g.innerWidthM,
			widthM: ANCHOR_STRIP_WIDTH_M,
			thicknessM: side.thickness,
			material: side.material,
			banding: { long: 0, short: 0 },
			machining: [],
			centre: {
				heightM: g.topUndersideM - ANCHOR_STRIP_WIDTH_M / 2,
				fromFrontM: f + g.insideDepthM - side.thickness / 2
			}
		});
	}

	// drawers and doors
	const counter = { drawer: 0, door: 0 };
	c.drawers.forEach((o, oi) => drawerParts(c, ci, xCase, g, o, oi, sink, counter));
	c.doors.forEach((o, oi) => doorParts(c, ci, xCase, g, o, oi, sink, counter));
}

/** Front size from the opening: an overlay front covers the opening's edges, an inset one sits in
 * it with a gap all round. */
function frontWidth(o: { front: DrawerOpeningDesign['front'] }, openingM: number) {
	return o.front.mount === 'overlay' ? openingM + 2 * o.front.overlay : openingM - 2 * o.front.gap;
}

function drawerParts(
	c: WallCaseDesign,
	ci: number,
	xCase: number,
	g: WallCaseGeometry,
	o: DrawerOpeningDesign,
	oi: number,
	sink: PartSink,
	counter: { drawer: number; door: number }
) {
	const open = openingWidth(c, g, o.bay);
	const at = ['cases', ci, 'drawers', oi];
	const b = o.box;
	const boxWidth = open.widthM - 2 * o.slide.sideClearance;
	const endLength = b.corners === 'butt' ? boxWidth - 2 * b.thickness : boxWidth - b.thickness;
	const inset = o.front.mount === 'inset';
	const boxFront = g.frameM + (inset ? o.front.thickness : 0);
	let z = o.bottom;
	o.heights.forEach((h, di) => {
		const n = `drawer ${oi + 1}.${di + 1}`;
		const boxH = h - b.heightClearance;
		const moving = { drawer: counter.drawer++ };
		const centre = { heightM: z + h / 2, fromFrontM: boxFront + o.slide.length / 2 };
		const common = { caseIndex: ci, path: at, machining: [] as string[], moving };
		const groove = `groove ${len(b.bottom.thickness)} wide × ${len(b.grooveDepth)} deep for the bottom`;
		const sideMachining = [
			groove,
			...(b.corners === 'rabbet'
				? [`rabbets ${len(b.thickness / 2)} deep at each end for the front and back`]
				: [])
		];
		for (let k = 0; k < 2; k++)
			sink.add({
				...common,
				role: 'drawer side',
				name: `${n} box side`,
				lengthM: o.slide.length,
				widthM: boxH,
				thicknessM: b.thickness,
				material: b.material,
				banding: { long: needsBanding(b.material) ? 1 : 0, short: 0 },
				machining: sideMachining,
				centre
			});
		for (const role of ['drawer box front', 'drawer box back'] as const)
			sink.add({
				...common,
				role,
				name: `${n} ${role.slice(7)}`,
				lengthM: endLength,
				widthM: boxH,
				thicknessM: b.thickness,
				material: b.material,
				banding: { long: needsBanding(b.material) ? 1 : 0, short: 0 },
				machining: [groove],
				centre
			});
		sink.add({
			...common,
			role: 'drawer bottom',
			name: `${n} bottom`,
			lengthM: boxWidth - 2 * b.thickness + 2 * b.grooveDepth,
			widthM: o.slide.length - 2 * b.thickness + 2 * b.grooveDepth,
			thicknessM: b.bottom.thickness,
			material: b.bottom.material,
			banding: { long: 0, short: 0 },
			machining: ['sits in the groove'],
			centre
		});
		const w = frontWidth(o, open.widthM);
		sink.add({
			...common,
			role: 'drawer front',
			name: `${n} front`,
			lengthM: w,
			widthM: h,
			thicknessM: o.front.thickness,
			material: o.front.material,
			banding: needsBanding(o.front.material) ? { long: 2, short: 2 } : { long: 0, short: 0 },
			elevation: { x: xCase + open.xM + (open.widthM - w) / 2, z, w, h: h },
			centre: {
				heightM: z + h / 2,
				fromFrontM: inset ? g.frameM + o.front.thickness / 2 : -o.front.thickness / 2
			}
		});
		z += h + o.front.gap;
	});
}

function doorParts(
	c: WallCaseDesign,
	ci: number,
	xCase: number,
	g: WallCaseGeometry,
	o: DoorOpeningDesign,
	oi: number,
	sink: PartSink,
	counter: { drawer: number; door: number }
) {
	const open = openingWidth(c, g, o.bay);
	const inset = o.front.mount === 'inset';
	const total = frontWidth(o, open.widthM);
	const w = (total - (o.count - 1) * o.front.gap) / o.count;
	const h = inset ? o.height - 2 * o.front.gap : o.height + 2 * o.front.overlay;
	const z = inset ? o.bottom + o.front.gap : o.bottom - o.front.overlay;
	const x0 = xCase + open.xM + (open.widthM - total) / 2;
	for (let leaf = 0; leaf < o.count; leaf++) {
		const door = counter.door++;
		sink.add({
			caseIndex: ci,
			role: 'door',
			name: `door ${oi + 1}${o.count > 1 ? `.${leaf + 1}` : ''}`,
			path: ['cases', ci, 'doors', oi],
			lengthM: h,
			widthM: w,
			thicknessM: o.front.thickness,
			material: o.front.material,
			banding: needsBanding(o.front.material) ? { long: 2, short: 2 } : { long: 0, short: 0 },
			machining: ['cup holes for the hinges'],
			elevation: { x: x0 + leaf * (w + o.front.gap), z, w, h },
			centre: {
				heightM: z + h / 2,
				fromFrontM: inset ? g.frameM + o.front.thickness / 2 : -o.front.thickness / 2
			},
			moving: { door }
		});
	}
}
