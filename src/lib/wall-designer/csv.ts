/**
 * The shop's lists as CSV files (papaparse writes them, quoting inch marks and commas): the cut
 * list, the sheet layouts' cut order and the hardware. Lengths are written as the user writes them
 * (fractions of an inch, decimal inches or millimetres).
 */
import Papa from 'papaparse';
import type { CutList } from '../engine/cutlist';
import { formatLength } from '../engine/units/length';
import type { Cut, SheetPlan } from '../engine/sheets';
import type { HardwareLine } from '../engine/wall/hardware';
import type { UserLengthUnit } from '../workbench/lengths';
import { tryParseLength } from '../engine/units/length';

/** A size for the shop in the user's unit, finer where that makes it exact (a 23/32" panel is not
 * written as 3/4" to someone who works in sixteenths). */
export function cutText(metres: number, unit: UserLengthUnit): string {
	const plain = formatLength(metres, { unit });
	if (unit === 'mm' || unit === 'decimal-in') return plain;
	for (const u of ['frac32', 'frac64'] as const) {
		const text = formatLength(metres, { unit: u });
		const back = tryParseLength(text);
		if (back.ok && Math.abs(back.value - metres) < 1e-9) return text;
	}
	return plain;
}

const EDGES = (b: { long: number; short: number }) =>
	b.long + b.short === 0 ? 'none' : `${b.long} long, ${b.short} short`;

export function cutListCsv(list: CutList, unit: UserLengthUnit): string {
	const L = (m: number) => cutText(m, unit);
	return Papa.unparse({
		fields: [
			'Mark',
			'Count',
			'Part',
			'Material',
			'Thickness',
			'Finished length',
			'Finished width',
			'Rough length',
			'Rough width',
			'Grain',
			'Banded edges',
			'Work'
		],
		data: list.groups.map((g) => [
			g.mark,
			g.count,
			g.name,
			g.materialName,
			L(g.thicknessM),
			L(g.lengthM),
			L(g.widthM),
			L(g.roughLengthM),
			L(g.roughWidthM),
			g.grain === 'length' ? `along the length (${g.grainReason})` : 'either way',
			EDGES(g.banding),
			g.machining.join('; ')
		])
	});
}

/** A cut in words, as the sawyer reads the cut order. */
export function cutOrderWords(c: Pick<Cut, 'kind' | 'strip' | 'mark' | 'marks'>): string {
	switch (c.kind) {
		case 'trim':
			return 'trim a factory edge';
		case 'rip-strip':
			return `rip strip ${c.strip} off the sheet`;
		case 'crosscut':
			return c.marks
				? `crosscut the stack of ${c.marks.join(', ')} off strip ${c.strip}`
				: `crosscut part ${c.mark} off strip ${c.strip}`;
		case 'crosscut-part':
			return `crosscut part ${c.mark} to length`;
		default:
			return `rip part ${c.mark} off its stack or to width`;
	}
}

export function sheetsCsv(plan: SheetPlan, unit: UserLengthUnit): string {
	const L = (m: number) => cutText(m, unit);
	const rows: (string | number)[][] = [];
	for (const s of plan.sheets)
		s.cuts.forEach((c, i) =>
			rows.push([s.materialName, s.index + 1, i + 1, cutOrderWords(c), c.mark ?? '', L(c.sizeM)])
		);
	return Papa.unparse({
		fields: ['Material', 'Sheet', 'Cut', 'What', 'Part', 'Leaves'],
		data: rows
	});
}

export function hardwareCsv(lines: HardwareLine[], unit: UserLengthUnit): string {
	return Papa.unparse({
		fields: ['What', 'Size', 'Count', 'Unit', 'Basis'],
		data: lines.map((h) => [
			h.label,
			h.sizeM ? formatLength(h.sizeM, { unit }) : '',
			h.count,
			h.unit,
			h.basis
		])
	});
}
