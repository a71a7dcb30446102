/**
 * Sag against the chosen variable, for the lab's chart: the engine run along the variable's whole
 * slider range with everything else as it is. The curve does not depend on where the chosen
 * variable stands, so a screen recomputes it only when something else moves.
 */
import {
	TIME_STOPS,
	runLab,
	shortName,
	sliders,
	SUPPORTS,
	type LabState,
	type LabUnits
} from './lab-state';
import { materials, sagAfter } from '../engine/index';

export type LabVariable = 'span' | 'thickness' | 'depth' | 'load' | 'material' | 'support' | 'time';

export const VARIABLES: { id: LabVariable; label: string }[] = [
	{ id: 'span', label: 'Span' },
	{ id: 'thickness', label: 'Thickness' },
	{ id: 'depth', label: 'Depth' },
	{ id: 'load', label: 'Load' },
	{ id: 'material', label: 'Material' },
	{ id: 'support', label: 'Support' },
	{ id: 'time', label: 'Time under load' }
];

export type Sweep =
	| { kind: 'curve'; points: [number, number][]; xLabel: string }
	| { kind: 'bars'; bars: { id: string; label: string; sagM: number }[] };

const KEY = { span: 'spanM', thickness: 'thicknessM', depth: 'depthM' } as const;

/** The state without the chosen variable: two states with equal keys share a sweep. */
export function sweepKey(s: LabState, v: LabVariable, units: LabUnits): string {
	const rest: Record<string, unknown> = { ...s, units, v };
	if (v in KEY) delete rest[KEY[v as keyof typeof KEY]];
	if (v === 'load') delete rest[s.loadKind === 'books' ? 'booksNPerM' : 'pointN'];
	if (v === 'material') delete rest.material;
	if (v === 'support') delete rest.support;
	if (v === 'time') delete rest.days;
	return JSON.stringify(rest);
}

const COUNT = 30;

export function sweep(s: LabState, v: LabVariable, units: LabUnits): Sweep {
	if (v === 'material')
		return {
			kind: 'bars',
			bars: materials.map((m) => ({
				id: m.id,
				label: shortName(m.id),
				sagM: runLab({ ...s, material: m.id }).sagM
			}))
		};
	if (v === 'support')
		return {
			kind: 'bars',
			bars: SUPPORTS.map((o) => ({
				id: o.id,
				label: o.label,
				sagM: runLab({ ...s, support: o.id }).sagM
			}))
		};
	if (v === 'time') {
		const r = runLab({ ...s, days: 0 }).result;
		const last = TIME_STOPS[TIME_STOPS.length - 1].days;
		const points: [number, number][] = [];
		for (let i = 0; i <= COUNT * 2; i++) {
			const d = (last * i) / (COUNT * 2);
			points.push([d, sagAfter(r.sag.instant, r.sag.longTerm, d)]);
		}
		return { kind: 'curve', points, xLabel: 'days under load' };
	}
	const spec =
		v === 'load'
			? sliders(units)[s.loadKind === 'books' ? 'booksNPerM' : 'pointN']
			: sliders(units)[KEY[v]];
	const points: [number, number][] = [];
	for (let i = 0; i <= COUNT; i++) {
		const value = spec.min + ((spec.max - spec.min) * i) / COUNT;
		const si = spec.toSI(value);
		points.push([value, runLab({ ...s, [spec.key]: si }).sagM]);
	}
	return { kind: 'curve', points, xLabel: `${spec.label.toLowerCase()}, ${spec.unit}` };
}

/** Where the current shelf stands on the chart: the x in the chart's own unit, or the bar's id. */
export function currentX(s: LabState, v: LabVariable, units: LabUnits): number | string {
	if (v === 'material') return s.material;
	if (v === 'support') return s.support;
	if (v === 'time') return s.days;
	const spec =
		v === 'load'
			? sliders(units)[s.loadKind === 'books' ? 'booksNPerM' : 'pointN']
			: sliders(units)[KEY[v]];
	return spec.fromSI(s[spec.key]);
}
