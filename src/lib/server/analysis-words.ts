/**
 * Saved shelf checks and comparisons in words: the governing sentence of a result and an input as
 * label/value rows, lengths in the reader's unit. Only formatting: every figure comes from the
 * engine's result.
 */
import {
	findMaterial,
	formatForce,
	formatLength,
	formatLineLoad,
	formatPressure,
	type ShelfInput,
	type ShelfResult
} from '$lib/engine';
import type { LengthUnit } from '$lib/schemas/preferences';

const metric = (unit: LengthUnit) => unit === 'mm';
const pct = (share: number) => `${Math.round(Math.abs(share) * 100)}%`;

export function materialName(material: ShelfInput['material']) {
	return typeof material === 'string' ? (findMaterial(material)?.name ?? material) : material.name;
}

/** 'Sags 1/16" when loaded, 1/8" long-term; within L/144 with 55% to spare.' */
export function shelfSentence(result: ShelfResult, unit: LengthUnit) {
	const len = (m: number) => formatLength(m, { unit });
	const sag =
		result.sag.checked === 'longTerm'
			? `Sags ${len(result.sag.instant)} when loaded, ${len(result.sag.longTerm)} long-term`
			: `Sags ${len(result.sag.instant)} under a brief load`;
	const { limit, strength } = result;
	const verdict = limit.pass
		? `within ${limit.name} with ${pct(limit.margin)} to spare`
		: `over ${limit.name} by ${pct(limit.margin)} (${len(limit.allowed)} allowed)`;
	const stress = strength.pass
		? ''
		: `; overstressed: bending stress at ${pct(strength.utilisation)} of the allowed`;
	return `${sag}; ${verdict}${stress}.`;
}

export interface CandidateOutcome {
	label: string;
	pass: boolean;
	sagM: number;
	limitName: string;
	margin: number;
}

/** '2 of 3 candidates meet L/144; stiffest: 3/4" birch multi-ply, 1/16" long-term, 60% to spare.' */
export function comparisonSentence(outcomes: CandidateOutcome[], unit: LengthUnit) {
	const passing = outcomes.filter((o) => o.pass).length;
	const best = [...outcomes].sort((a, b) => a.sagM - b.sagM)[0];
	const limit = best?.limitName ?? 'the limit';
	const head = `${passing} of ${outcomes.length} candidates ${passing === 1 ? 'meets' : 'meet'} ${limit}`;
	if (!best) return `${head}.`;
	const spare = best.margin >= 0 ? `${pct(best.margin)} to spare` : `over by ${pct(best.margin)}`;
	return `${head}; least sag: ${best.label}, ${formatLength(best.sagM, { unit })}, ${spare}.`;
}

function loadWords(load: ShelfInput['loads'][number], unit: LengthUnit) {
	const len = (m: number) => formatLength(m, { unit });
	if (load.kind === 'area')
		return `${formatPressure(load.pressure, { unit: metric(unit) ? 'kPa' : 'lbf/ft²' })} over the top`;
	if (load.kind === 'point')
		return `${formatForce(load.force, { unit: metric(unit) ? 'N' : 'lbf' })} at ${len(load.at)}`;
	const along =
		load.from !== undefined || load.to !== undefined
			? ` from ${len(load.from ?? 0)} to ${load.to !== undefined ? len(load.to) : 'the end'}`
			: ' along the span';
	return `${formatLineLoad(load.intensity, { unit: metric(unit) ? 'N/m' : 'lbf/ft' })}${along}`;
}

function supportWords(support: ShelfInput['support'], unit: LengthUnit) {
	if (typeof support === 'string')
		return {
			simple: 'Resting on both ends',
			fixed: 'Fixed at both ends',
			cantilever: 'Cantilever'
		}[support];
	const spans = support.spans.map((s) => formatLength(s, { unit })).join(' + ');
	return `Continuous over ${support.spans.length} spans (${spans}), ends ${support.ends}`;
}

function limitWords(limit: ShelfInput['limit'], unit: LengthUnit) {
	if (typeof limit === 'string') return limit;
	return 'ratio' in limit ? `L/${limit.ratio}` : `${formatLength(limit.length, { unit })} at most`;
}

/** The parts of a shelf request a reader checks, in order, without the material or thickness. */
export function shelfSettingRows(
	input: Omit<ShelfInput, 'material' | 'thickness'>,
	unit: LengthUnit
) {
	const len = (m: number) => formatLength(m, { unit });
	const rows: [string, string][] = [];
	if (input.span !== undefined) rows.push(['Span', len(input.span)]);
	rows.push(['Depth', len(input.depth)]);
	rows.push(['Grain', input.grain === 'along' ? 'Along the span' : 'Across the span']);
	rows.push(['Support', supportWords(input.support, unit)]);
	rows.push([
		'Loads',
		input.loads.length ? input.loads.map((l) => loadWords(l, unit)).join('; ') : 'None given'
	]);
	rows.push(['Own weight', input.selfWeight ? 'Counted' : 'Left out']);
	rows.push(['Edges', edgesWords(input.edges, unit)]);
	rows.push(['Duration', input.duration === 'long' ? 'Long (months or years)' : 'Brief']);
	rows.push(['Service', input.service]);
	rows.push(['Limit', limitWords(input.limit, unit)]);
	return rows;
}

export function edgesWords(edges: ShelfInput['edges'], unit: LengthUnit) {
	if (!edges.length) return 'None';
	const len = (m: number) => formatLength(m, { unit });
	return edges
		.map(
			(e) => `${e.side} strip ${len(e.height)} × ${len(e.thickness)} of ${materialName(e.material)}`
		)
		.join('; ');
}

export function shelfInputRows(input: ShelfInput, unit: LengthUnit): [string, string][] {
	const rows = shelfSettingRows(input, unit);
	rows.splice(
		2,
		0,
		['Thickness', formatLength(input.thickness, { unit })],
		['Material', materialName(input.material)]
	);
	return rows;
}
