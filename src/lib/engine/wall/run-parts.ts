/** Face frames and bases: per case, or shared across the run. */
import type { WallCaseGeometry } from './geometry';
import type { PartSink } from './parts';
import type { WallCaseDesign, WallDesign } from './types';

/** A board longer than this is made in pieces joined over a support (a choice of this tool: an
 * 8' sheet less trim). */
const LONGEST_BOARD_M = 2.4;

function pieces(total: number) {
	const n = Math.max(1, Math.ceil(total / LONGEST_BOARD_M - 1e-9));
	return { n, each: total / n };
}

export function runParts(
	w: WallDesign,
	geoms: WallCaseGeometry[],
	xs: number[],
	sink: PartSink
): string[] {
	const notes: string[] = [];
	const n = w.cases.length;
	const runWidth = xs[n - 1] + w.cases[n - 1].width;

	// face frames
	const frames = w.cases.map((c) => c.faceFrame);
	const shareFrame = w.sharedFaceFrame && n > 1 && frames.every((f) => f);
	if (w.sharedFaceFrame && n > 1 && !shareFrame)
		notes.push('A shared face frame needs a frame on every case: each case keeps its own.');
	w.cases.forEach((c, ci) => {
		const f = c.faceFrame;
		if (!f) return;
		const g = geoms[ci];
		const z = c.height - g.sideLengthM;
		const stile = (side: 'left' | 'right', width: number, x: number, name: string) =>
			sink.add({
				caseIndex: ci,
				role: 'face-frame stile',
				name,
				path: ['cases', ci, 'faceFrame'],
				lengthM: g.sideLengthM,
				widthM: width,
				thicknessM: f.thickness,
				material: f.material,
				banding: { long: 0, short: 0 },
				machining: [],
				elevation: { x, z, w: width, h: g.sideLengthM },
				centre: { heightM: z + g.sideLengthM / 2, fromFrontM: f.thickness / 2 }
			});
		const x = xs[ci];
		if (!shareFrame || ci === 0)
			stile('left', f.stileWidth, x, shareFrame ? 'end stile' : 'left stile');
		if (!shareFrame || ci === n - 1)
			stile(
				'right',
				f.stileWidth,
				x + c.width - f.stileWidth,
				shareFrame ? 'end stile' : 'right stile'
			);
		else {
			const next = w.cases[ci + 1].faceFrame!;
			const sg = geoms[ci + 1];
			const width = f.stileWidth + next.stileWidth;
			// a shared stile runs the lower case's height and covers both sides where they meet
			const h = Math.min(g.sideLengthM, sg.sideLengthM);
			sink.add({
				caseIndex: ci,
				role: 'face-frame stile',
				name: 'shared stile',
				path: ['cases', ci, 'faceFrame'],
				lengthM: h,
				widthM: width,
				thicknessM: f.thickness,
				material: f.material,
				banding: { long: 0, short: 0 },
				machining: [],
				elevation: { x: x + c.width - f.stileWidth, z, w: width, h },
				centre: { heightM: z + h / 2, fromFrontM: f.thickness / 2 }
			});
			if (Math.abs(g.sideLengthM - sg.sideLengthM) > 1e-6)
				notes.push(
					`Cases ${ci + 1} and ${ci + 2} differ in height: the shared stile runs the lower one's height, and the taller one's exposed edge above it needs its own strip.`
				);
		}
		for (const [k, name] of (['top rail', 'bottom rail'] as const).entries())
			sink.add({
				caseIndex: ci,
				role: 'face-frame rail',
				name,
				path: ['cases', ci, 'faceFrame'],
				lengthM: c.width - 2 * f.stileWidth,
				widthM: f.railWidth,
				thicknessM: f.thickness,
				material: f.material,
				banding: { long: 0, short: 0 },
				machining: [],
				elevation: {
					x: x + f.stileWidth,
					z: k === 0 ? c.height - f.railWidth : z,
					w: c.width - 2 * f.stileWidth,
					h: f.railWidth
				},
				centre: {
					heightM: k === 0 ? c.height - f.railWidth / 2 : z + f.railWidth / 2,
					fromFrontM: f.thickness / 2
				}
			});
		midRails(c, ci, g, x, z, sink);
	});

	// bases
	const bases = w.cases.map((c) => c.base);
	const sameBase =
		bases.every((b) => b && b.height > 0) &&
		bases.every(
			(b) =>
				Math.abs(b!.height - bases[0]!.height) < 1e-6 &&
				Math.abs(b!.setback - bases[0]!.setback) < 1e-6
		);
	const shareKick = w.sharedToeKick && n > 1 && sameBase;
	if (w.sharedToeKick && n > 1 && !sameBase)
		notes.push(
			'A shared toe kick needs the same base height and set-back under every case: each case keeps its own.'
		);
	w.cases.forEach((c, ci) => {
		const b = c.base;
		if (!b || b.height <= 0) return;
		const g = geoms[ci];
		const m = b.material ?? c.sides.material;
		const t = b.thickness ?? c.sides.thickness;
		const board = (
			role: 'toe kick' | 'plinth back' | 'plinth end',
			name: string,
			l: number,
			count: number,
			fromFront: number
		) => {
			for (let k = 0; k < count; k++)
				sink.add({
					caseIndex: ci,
					role,
					name,
					path: ['cases', ci, 'base'],
					lengthM: l,
					widthM: b.height,
					thicknessM: t,
					material: m,
					banding: { long: 0, short: 0 },
					machining: [],
					elevation:
						role === 'toe kick'
							? { x: xs[ci] + (c.width - l) / 2, z: 0, w: l, h: b.height }
							: undefined,
					centre: { heightM: b.height / 2, fromFrontM: fromFront }
				});
		};
		if (b.kind === 'plinth') {
			if (!shareKick) board('toe kick', 'plinth front', c.width, 1, b.setback + t / 2);
			board('plinth back', 'plinth back', c.width, 1, c.depth - t / 2);
			board('plinth end', 'plinth end', c.depth - b.setback - 2 * t, 2, (c.depth + b.setback) / 2);
		} else if (!shareKick) board('toe kick', 'toe kick', g.innerWidthM, 1, b.setback + t / 2);
	});
	if (shareKick) {
		const b = w.cases[0].base!;
		const { n: count, each } = pieces(runWidth);
		const m = b.material ?? w.cases[0].sides.material;
		const t = b.thickness ?? w.cases[0].sides.thickness;
		for (let k = 0; k < count; k++)
			sink.add({
				caseIndex: null,
				role: 'toe kick',
				name: count > 1 ? `run toe kick, piece ${k + 1} of ${count}` : 'run toe kick',
				path: ['sharedToeKick'],
				lengthM: each,
				widthM: b.height,
				thicknessM: t,
				material: m,
				banding: { long: 0, short: 0 },
				machining: [],
				elevation: { x: k * each, z: 0, w: each, h: b.height },
				centre: { heightM: b.height / 2, fromFrontM: b.setback + t / 2 }
			});
		if (count > 1) notes.push(`The run's toe kick is ${count} pieces, joined over a plinth end.`);
	}
	return notes;
}

/**
 * Rails between openings: where one drawer front meets the next, and at the top and bottom of a
 * stack of drawers or a door opening that do not meet the frame's top or bottom rail. Each is
 * centred on the line between the openings and spans the opening's width (the frame opening in a
 * case of one bay, else the bay's width); the frame's joint (pocket screws or biscuits) joins it
 * to the stiles at both ends.
 */
function midRails(
	c: WallCaseDesign,
	ci: number,
	g: WallCaseGeometry,
	xCase: number,
	zFrame: number,
	sink: PartSink
) {
	const f = c.faceFrame!;
	const seen: { z: number; bay: number }[] = [];
	const lowest = zFrame + f.railWidth;
	const highest = c.height - f.railWidth;
	const near = 1e-4;
	const lines: { z: number; bay: number; what: string }[] = [];
	c.drawers.forEach((o, oi) => {
		let z = o.bottom;
		const name = o.name ?? `drawers ${oi + 1}`;
		lines.push({ z, bay: o.bay ?? 0, what: `${name}, below` });
		o.heights.forEach((h, k) => {
			z += h;
			lines.push({
				z,
				bay: o.bay ?? 0,
				what: k === o.heights.length - 1 ? `${name}, above` : `${name}, ${k + 1}–${k + 2}`
			});
		});
	});
	c.doors.forEach((o, oi) => {
		const name = o.name ?? `doors ${oi + 1}`;
		lines.push({ z: o.bottom, bay: o.bay ?? 0, what: `${name}, below` });
		lines.push({ z: o.bottom + o.height, bay: o.bay ?? 0, what: `${name}, above` });
	});
	for (const line of lines.sort((a, b) => a.z - b.z)) {
		// the frame's own top and bottom rails already close the frame there
		if (line.z - f.railWidth / 2 < lowest - near || line.z + f.railWidth / 2 > highest + near)
			continue;
		if (seen.some((s) => s.bay === line.bay && Math.abs(s.z - line.z) < f.railWidth)) continue;
		seen.push(line);
		const single = g.bays.length === 1;
		const b = g.bays[line.bay] ?? g.bays[0];
		const x0 = single ? f.stileWidth : b.xM;
		const len = single ? c.width - 2 * f.stileWidth : b.widthM;
		sink.add({
			caseIndex: ci,
			role: 'face-frame rail',
			name: `mid rail (${line.what})`,
			path: ['cases', ci, 'faceFrame'],
			lengthM: len,
			widthM: f.railWidth,
			thicknessM: f.thickness,
			material: f.material,
			banding: { long: 0, short: 0 },
			machining: [],
			elevation: { x: xCase + x0, z: line.z - f.railWidth / 2, w: len, h: f.railWidth },
			centre: { heightM: line.z, fromFrontM: f.thickness / 2 }
		});
	}
}
