/**
 * Stored inputs as label/value rows, for reading an earlier version of a saved analysis: lengths
 * and forces in the reader's unit. Only formatting; nothing here is computed.
 */
import { findMaterial } from '../../../reference/materials';
import { formatLength } from '../engine/units/length';
import { formatForce, formatLineLoad, formatPressure } from '../engine/units/quantity';
import type { ComparisonInput } from '../schemas/analysis';
import type { jointShape } from '../schemas/joinery';
import type { ShelfInput } from '../schemas/shelf';
import type { stabilityShape } from '../schemas/stability';
import type { z } from 'zod';
import type { ReaderUnit } from './words';

const metric = (unit: ReaderUnit) => unit === 'mm';

export function materialName(material: ShelfInput['material']) {
	return typeof material === 'string' ? (findMaterial(material)?.name ?? material) : material.name;
}

function loadWords(load: ShelfInput['loads'][number], unit: ReaderUnit) {
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

function supportWords(support: ShelfInput['support'], unit: ReaderUnit) {
	if (typeof support === 'string')
		return {
			simple: 'Resting on both ends',
			fixed: 'Fixed at both ends',
			cantilever: 'Cantilever'
		}[support];
	const spans = support.spans.map((s) => formatLength(s, { unit })).join(' + ');
	const over =
		support.divider === undefined
			? `${spans}, centre to centre of the dividers`
			: `${spans} clear, dividers ${formatLength(support.divider, { unit })} thick`;
	return `Continuous over ${support.spans.length} spans (${over}), ends ${support.ends}`;
}

function limitWords(limit: ShelfInput['limit'], unit: ReaderUnit) {
	if (typeof limit === 'string') return limit;
	return 'ratio' in limit ? `L/${limit.ratio}` : `${formatLength(limit.length, { unit })} at most`;
}

/** The parts of a shelf request a reader checks, in order, without the material or thickness. */
export function shelfSettingRows(
	input: Omit<ShelfInput, 'material' | 'thickness'>,
	unit: ReaderUnit
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

function edgesWords(edges: ShelfInput['edges'], unit: ReaderUnit) {
	if (!edges.length) return 'None';
	const len = (m: number) => formatLength(m, { unit });
	return edges
		.map(
			(e) => `${e.side} strip ${len(e.height)} × ${len(e.thickness)} of ${materialName(e.material)}`
		)
		.join('; ');
}

export function shelfRows(input: ShelfInput, unit: ReaderUnit): [string, string][] {
	const rows = shelfSettingRows(input, unit);
	rows.splice(
		2,
		0,
		['Thickness', formatLength(input.thickness, { unit })],
		['Material', materialName(input.material)]
	);
	return rows;
}

export function comparisonRows(input: ComparisonInput, unit: ReaderUnit): [string, string][] {
	return [
		...shelfSettingRows(input.shelf, unit),
		...input.candidates.map((c, i): [string, string] => [
			`Candidate ${i + 1}`,
			`${c.label ? `${c.label}: ` : ''}${formatLength(c.thickness, { unit })} ${materialName(c.material)}` +
				(c.edges ? `; edges: ${edgesWords(c.edges, unit)}` : '')
		])
	];
}

const stockName = (m: z.output<typeof jointShape>['endPiece']['material']) =>
	typeof m === 'string' ? m : (m.name ?? `${m.kind}, specific gravity ${m.specificGravity}`);

export function jointRows(
	input: z.output<typeof jointShape>,
	unit: ReaderUnit
): [string, string][] {
	const len = (m: number) => formatLength(m, { unit });
	const rows: [string, string][] = [
		['Joint', input.kind.replaceAll('-', ' ')],
		['Fastener', input.fastener.replace('-', ' ')],
		['Length of the joint', len(input.length)],
		['End piece', `${len(input.endPiece.thickness)} ${stockName(input.endPiece.material)}`],
		['Face piece', `${len(input.facePiece.thickness)} ${stockName(input.facePiece.material)}`]
	];
	const force = (n: number) => formatForce(n, { unit: metric(unit) ? 'N' : 'lbf' });
	if (input.demand?.shear !== undefined)
		rows.push(['Load on the joint', force(input.demand.shear)]);
	if (input.options?.count !== undefined) rows.push(['Fasteners', String(input.options.count)]);
	return rows;
}

export function stabilityRows(
	input: z.output<typeof stabilityShape>,
	unit: ReaderUnit
): [string, string][] {
	const len = (m: number) => formatLength(m, { unit });
	const force = (n: number) => formatForce(n, { unit: metric(unit) ? 'N' : 'lbf' });
	const c = input.construction;
	const rows: [string, string][] = [
		['Height × width × depth', `${len(input.height)} × ${len(input.width)} × ${len(input.depth)}`],
		['Empty case', 'parts' in c ? `${c.parts.length} parts` : force(c.weight)]
	];
	for (const [i, x] of (input.contents ?? []).entries())
		rows.push([`Shelf ${i + 1}`, `${force(x.weight)} at ${len(x.height)}`]);
	for (const [i, d] of (input.drawers ?? []).entries())
		rows.push([`Drawer ${i + 1}`, `${force(d.weight)} at ${len(d.height)}`]);
	if (input.base?.setback) rows.push(['Feet set back', len(input.base.setback)]);
	rows.push([
		'Fixed to the wall',
		input.anchoring?.kind && input.anchoring.kind !== 'none'
			? input.anchoring.kind.replaceAll('-', ' ')
			: 'No'
	]);
	return rows;
}
