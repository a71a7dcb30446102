import { InputError } from '../errors';
import { nonNegative, positive } from '../joinery/validate';
import type { MassPoint } from './statics';
import type { Construction, StabilityRequest } from './types';

const LIST_MAX = 500;

/** The case's own weight as mass points, from a given mass or from its parts. */
export function casePoints(req: StabilityRequest): MassPoint[] {
	const c: Construction = req.construction;
	if (!c || typeof c !== 'object')
		throw InputError.at('construction', 'expected { massKg } or { parts }');
	if ('parts' in c) {
		if (!Array.isArray(c.parts) || c.parts.length === 0 || c.parts.length > LIST_MAX)
			throw InputError.at('construction.parts', `expected 1 to ${LIST_MAX} parts`);
		return c.parts.map((p, i) => {
			const f = `construction.parts.${i}`;
			const massKg =
				p.massKg !== undefined
					? nonNegative(p.massKg, `${f}.massKg`)
					: positive(p.lengthM, `${f}.lengthM`) *
						positive(p.widthM, `${f}.widthM`) *
						positive(p.thicknessM, `${f}.thicknessM`) *
						positive(p.densityKgPerM3, `${f}.densityKgPerM3`);
			return {
				massKg,
				xM: within(p.centreFromFrontM, 0, req.depthM, `${f}.centreFromFrontM`),
				zM: within(p.centreHeightM, 0, req.heightM, `${f}.centreHeightM`)
			};
		});
	}
	return [
		{
			massKg: positive(c.massKg, 'construction.massKg'),
			xM:
				c.centreFromFrontM === undefined
					? req.depthM / 2
					: within(c.centreFromFrontM, 0, req.depthM, 'construction.centreFromFrontM'),
			zM:
				c.centreHeightM === undefined
					? req.heightM / 2
					: within(c.centreHeightM, 0, req.heightM, 'construction.centreHeightM')
		}
	];
}

export function contentsPoints(req: StabilityRequest): MassPoint[] {
	const list = req.contents ?? [];
	if (list.length > LIST_MAX)
		throw InputError.at('contents', `expected at most ${LIST_MAX} entries`);
	return list.map((c, i) => ({
		massKg: nonNegative(c.massKg, `contents.${i}.massKg`),
		xM:
			c.centreFromFrontM === undefined
				? req.depthM / 2
				: within(c.centreFromFrontM, 0, req.depthM, `contents.${i}.centreFromFrontM`),
		zM:
			within(c.heightM, 0, req.heightM, `contents.${i}.heightM`) +
			nonNegative(c.itemHeightM ?? 0, `contents.${i}.itemHeightM`) / 2
	}));
}

/** The same contents rearranged: the heaviest on the lowest shelves (`low`) or the highest (`high`). */
export function rearranged(points: MassPoint[], order: 'low' | 'high'): MassPoint[] {
	const places = points.map((p) => ({ xM: p.xM, zM: p.zM })).sort((a, b) => a.zM - b.zM);
	const masses = points.map((p) => p.massKg).sort((a, b) => (order === 'low' ? b - a : a - b));
	return places.map((pl, i) => ({ xM: pl.xM, zM: pl.zM, massKg: masses[i] }));
}

/** Drawers and doors, shut or open. An open drawer's weight moves forward by its extension; an open
 * door swings its weight half its width in front of the case. */
export function frontPoints(req: StabilityRequest, open: boolean, loaded: boolean): MassPoint[] {
	const drawers = req.drawers ?? [];
	const doors = req.doors ?? [];
	if (drawers.length > LIST_MAX) throw InputError.at('drawers', `expected at most ${LIST_MAX}`);
	if (doors.length > LIST_MAX) throw InputError.at('doors', `expected at most ${LIST_MAX}`);
	const out: MassPoint[] = drawers.map((d, i) => ({
		massKg:
			nonNegative(d.massKg, `drawers.${i}.massKg`) +
			(loaded ? nonNegative(d.contentsKg ?? 0, `drawers.${i}.contentsKg`) : 0),
		xM:
			(d.centreFromFrontM === undefined
				? req.depthM / 2
				: within(d.centreFromFrontM, -req.depthM, req.depthM, `drawers.${i}.centreFromFrontM`)) -
			(open ? drawerExtension(req, i) : 0),
		zM: within(d.heightM, 0, req.heightM, `drawers.${i}.heightM`)
	}));
	doors.forEach((d, i) =>
		out.push({
			massKg: nonNegative(d.massKg, `doors.${i}.massKg`),
			xM: open ? -positive(d.widthM, `doors.${i}.widthM`) / 2 : 0,
			zM: within(d.centreHeightM, 0, req.heightM, `doors.${i}.centreHeightM`)
		})
	);
	return out;
}

/** How far drawer i opens: as given, else 2/3 of the case depth (common practice for side-mount
 * slides, no source). */
export function drawerExtension(req: StabilityRequest, i: number): number {
	const e = req.drawers![i].extensionM;
	return e === undefined
		? (2 / 3) * req.depthM
		: within(e, 0, req.depthM * 1.25, `drawers.${i}.extensionM`);
}

function within(v: unknown, min: number, max: number, field: string): number {
	if (typeof v !== 'number' || !Number.isFinite(v) || v < min || v > max)
		throw InputError.at(
			field,
			`expected a number from ${min} to ${max.toPrecision(4)} (metres), got ${String(v)}`
		);
	return v;
}
