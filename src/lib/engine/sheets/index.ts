/**
 * Sheet layouts a track saw and a table saw can follow. Parts are packed in strips ripped off the
 * sheet, stacks crosscut off each strip and parts ripped off each stack (strips.ts, with a
 * general-purpose shelf packer filling each strip); the rules of the shop are ours: every part at
 * its rough size plus a saw kerf, a trim at the factory edges, the sheet's grain along its length,
 * parts that must keep their grain never turned, and only edge-to-edge cuts. The cut order follows
 * from the strips and stacks.
 */
import type { CutGroup } from '../cutlist';
import { METRES_PER_INCH } from '../units/length';
import {
	crossingBound,
	packStrips,
	type Item,
	type Lie,
	type Order,
	type PackedSheet
} from './strips';

export interface SheetStock {
	materialName: string;
	/** along the sheet's grain (8' of a 4×8 sheet) */
	lengthM: number;
	widthM: number;
	/** keep every part's grain along the sheet's, for looks (parts that carry load always keep it) */
	keepGrain: boolean;
}

interface SheetOptions {
	kerfM: number;
	/** cut off each factory edge before any part */
	trimM: number;
	/** a leftover counts as usable when its short side and its long side reach these */
	offcutMinWidthM: number;
	offcutMinLengthM: number;
	stocks: SheetStock[];
	/** stock for a material not listed (4×8 by default) */
	defaultStock: Omit<SheetStock, 'materialName'>;
}

export interface Placement {
	mark: string;
	/** the group's index in the cut list */
	group: number;
	/** from the sheet's corner (factory edge), x along the sheet's length */
	xM: number;
	yM: number;
	/** along x and along y, at the rough size */
	wM: number;
	hM: number;
	/** the part's length runs across the sheet */
	turned: boolean;
}

export interface Cut {
	/** trim a factory edge; rip a strip off the sheet along its length; crosscut a part (or a
	 * stack of parts) off its strip; rip a part off its stack, or to width; crosscut a part shorter
	 * than its stack to length */
	kind: 'trim' | 'rip-strip' | 'crosscut' | 'rip-part' | 'crosscut-part';
	/** the strip (1 up) the cut belongs to, and the part's mark */
	strip?: number;
	mark?: string;
	/** a crosscut that frees a stack: the marks of its parts, lowest first */
	marks?: string[];
	/** the width or length the cut leaves: the trim, the strip's width, the part's length or width */
	sizeM: number;
	/** the cut line: x = constant (crosscut) or y = constant (rip), from x0 to x1 or y0 to y1 */
	line: { x0: number; y0: number; x1: number; y1: number };
}

export interface Offcut {
	xM: number;
	yM: number;
	wM: number;
	hM: number;
}

export interface SheetLayout {
	materialName: string;
	index: number;
	lengthM: number;
	widthM: number;
	placements: Placement[];
	cuts: Cut[];
	offcuts: Offcut[];
	/** area of the parts over the area of the sheet */
	yield: number;
}

export interface SheetPlan {
	sheets: SheetLayout[];
	perMaterial: {
		materialName: string;
		sheets: number;
		lengthM: number;
		widthM: number;
		partAreaM2: number;
		yield: number;
		/** the parts' area over one sheet's, rounded up */
		areaBound: number;
		/** no layout can use fewer sheets: the larger of the area bound (on the sheet less its
		 * trim) and the bound from parts too wide to lie three across (strips.ts) */
		lowerBound: number;
	}[];
	/** parts too large for their sheet, or solid wood cut from boards */
	notOnSheets: { mark: string; count: number; reason: string }[];
	options: SheetOptions;
}

const INCH = METRES_PER_INCH;
/** 4×8 sheet, 1/8" kerf, 1/4" trim, 3" × 12" smallest useful offcut: choices of this tool. */
export const DEFAULT_SHEET_OPTIONS: SheetOptions = {
	kerfM: INCH / 8,
	trimM: INCH / 4,
	offcutMinWidthM: 3 * INCH,
	offcutMinLengthM: 12 * INCH,
	stocks: [],
	defaultStock: { lengthM: 96 * INCH, widthM: 48 * INCH, keepGrain: false }
};

/** Work in whole micrometres so that equal sizes compare equal. */
const U = 1e6;
const up = (m: number) => Math.ceil(m * U - 1e-6);
const si = (u: number) => u / U;

/** Nest the sheet-good groups of a cut list onto sheets, one material at a time. */
export function planSheets(
	groups: CutGroup[],
	solid: (g: CutGroup) => boolean,
	options: SheetOptions = DEFAULT_SHEET_OPTIONS
): SheetPlan {
	const notOnSheets: SheetPlan['notOnSheets'] = [];
	const byMaterial = new Map<string, Item[]>();
	groups.forEach((g, gi) => {
		if (solid(g)) {
			notOnSheets.push({ mark: g.mark, count: g.count, reason: 'solid wood: cut from boards' });
			return;
		}
		const stock = stockFor(g.materialName, options);
		const locked = g.grainReason === 'strength' || (g.grain === 'length' && stock.keepGrain);
		const items = byMaterial.get(g.materialName) ?? [];
		for (let k = 0; k < g.count; k++)
			items.push({ group: gi, mark: g.mark, l: up(g.roughLengthM), w: up(g.roughWidthM), locked });
		byMaterial.set(g.materialName, items);
	});

	const sheets: SheetLayout[] = [];
	const perMaterial: SheetPlan['perMaterial'] = [];
	for (const [materialName, items] of byMaterial) {
		const stock = stockFor(materialName, options);
		const mine = nest(materialName, items, stock, options, notOnSheets);
		sheets.push(...mine);
		const sheetArea = stock.lengthM * stock.widthM;
		const trim = up(options.trimM);
		const L = Math.floor(stock.lengthM * U) - 2 * trim;
		const W = Math.floor(stock.widthM * U) - 2 * trim;
		const fits = items.filter(
			(it) => (it.l <= L && it.w <= W) || (!it.locked && it.w <= L && it.l <= W)
		);
		const partArea = mine.reduce(
			(a, s) => a + s.placements.reduce((b, p) => b + p.wM * p.hM, 0),
			0
		);
		perMaterial.push({
			materialName,
			sheets: mine.length,
			lengthM: stock.lengthM,
			widthM: stock.widthM,
			partAreaM2: partArea,
			yield: mine.length ? partArea / (mine.length * sheetArea) : 0,
			areaBound: Math.ceil(partArea / sheetArea - 1e-9),
			lowerBound: Math.max(
				Math.ceil(partArea / (si(L) * si(W)) - 1e-9),
				crossingBound(fits, L, W, up(options.kerfM))
			)
		});
	}
	return { sheets, perMaterial, notOnSheets, options };
}

function stockFor(materialName: string, o: SheetOptions): SheetStock {
	return (
		o.stocks.find((s) => s.materialName === materialName) ?? { materialName, ...o.defaultStock }
	);
}

function nest(
	materialName: string,
	items: Item[],
	stock: SheetStock,
	o: SheetOptions,
	notOnSheets: SheetPlan['notOnSheets']
): SheetLayout[] {
	const kerf = up(o.kerfM);
	const trim = up(o.trimM);
	const L = Math.floor(stock.lengthM * U) - 2 * trim;
	const W = Math.floor(stock.widthM * U) - 2 * trim;
	// Several plans, keep the one with the fewest sheets (then the least used on the last sheet,
	// which leaves the largest offcut): free parts lie narrow side across the strip or wide side
	// across; parts go in by their height across the strip, by area or by length.
	let best: ReturnType<typeof packStrips> | null = null;
	let bestLast = Infinity;
	for (const lie of ['narrow', 'wide'] as Lie[])
		for (const order of ['height', 'area', 'length'] as Order[]) {
			const trial = packStrips(items, lie, order, L, W, kerf);
			const last = trial.sheets.at(-1)?.used ?? 0;
			if (!best || trial.sheets.length < best.sheets.length) [best, bestLast] = [trial, last];
			else if (trial.sheets.length === best.sheets.length && last < bestLast)
				[best, bestLast] = [trial, last];
		}
	const tooBig = new Map<string, number>();
	for (const it of best!.tooBig) tooBig.set(it.mark, (tooBig.get(it.mark) ?? 0) + 1);
	for (const [mark, count] of tooBig)
		notOnSheets.push({
			mark,
			count,
			reason: `larger than a ${materialName} sheet less its trim (or its grain cannot turn to fit)`
		});
	return best!.sheets.map((p, i) => layoutOf(materialName, i, stock, p, o));
}

/** The placements, the cuts in order and the usable leftovers of one packed sheet. */
function layoutOf(
	materialName: string,
	index: number,
	stock: SheetStock,
	packed: PackedSheet,
	o: SheetOptions
): SheetLayout {
	const kerf = o.kerfM;
	const trim = o.trimM;
	const L = stock.lengthM;
	const Wd = stock.widthM;
	const cuts: Cut[] = [];
	const offcuts: Offcut[] = [];
	const placements: Placement[] = [];
	const xMax = L - trim;
	const yMax = Wd - trim;
	const at = (u: number) => si(u) + trim;
	if (trim > 0)
		cuts.push(
			{ kind: 'trim', sizeM: trim, line: { x0: 0, y0: trim, x1: L, y1: trim } },
			{ kind: 'trim', sizeM: trim, line: { x0: 0, y0: yMax, x1: L, y1: yMax } },
			{ kind: 'trim', sizeM: trim, line: { x0: trim, y0: trim, x1: trim, y1: yMax } },
			{ kind: 'trim', sizeM: trim, line: { x0: xMax, y0: trim, x1: xMax, y1: yMax } }
		);
	const offcut = (x: number, y: number, w: number, h: number) => {
		const short = Math.min(w, h);
		const long = Math.max(w, h);
		if (short >= o.offcutMinWidthM - 1e-9 && long >= o.offcutMinLengthM - 1e-9)
			offcuts.push({ xM: x, yM: y, wM: w, hM: h });
	};
	let yEnd = trim;
	packed.strips.forEach((strip, k) => {
		const n = k + 1;
		const y = at(strip.y);
		const h = si(strip.h);
		cuts.push({
			kind: 'rip-strip',
			strip: n,
			sizeM: h,
			line: { x0: trim, y0: y + h + kerf / 2, x1: xMax, y1: y + h + kerf / 2 }
		});
		let xEnd = trim;
		for (const stack of strip.stacks) {
			const x = at(stack.x);
			const w = si(stack.w);
			const marks = stack.parts.map((p) => p.item.mark);
			cuts.push({
				kind: 'crosscut',
				strip: n,
				...(marks.length === 1 ? { mark: marks[0] } : { marks }),
				sizeM: w,
				line: { x0: x + w + kerf / 2, y0: y, x1: x + w + kerf / 2, y1: y + h }
			});
			let top = y;
			stack.parts.forEach((p, j) => {
				const pm: Placement = {
					mark: p.item.mark,
					group: p.item.group,
					xM: at(p.px),
					yM: at(p.py),
					wM: si(p.x),
					hM: si(p.y),
					turned: p.turned
				};
				placements.push(pm);
				const last = j === stack.parts.length - 1;
				const rest = y + h - (pm.yM + pm.hM);
				// rip the part off what is left of the stack (the last part only if it is narrower)
				if (!last || rest > 1e-9) {
					const yl = pm.yM + pm.hM + kerf / 2;
					cuts.push({
						kind: 'rip-part',
						strip: n,
						mark: pm.mark,
						sizeM: pm.hM,
						line: { x0: x, y0: yl, x1: x + w, y1: yl }
					});
				}
				if (pm.wM < w - 1e-9) {
					const xl = pm.xM + pm.wM + kerf / 2;
					cuts.push({
						kind: 'crosscut-part',
						strip: n,
						mark: pm.mark,
						sizeM: pm.wM,
						line: { x0: xl, y0: pm.yM, x1: xl, y1: pm.yM + pm.hM }
					});
					offcut(pm.xM + pm.wM + kerf, pm.yM, w - pm.wM - kerf, pm.hM);
				}
				top = pm.yM + pm.hM + kerf;
			});
			offcut(x, top, w, y + h - top);
			xEnd = x + w + kerf;
		}
		offcut(xEnd, y, xMax - xEnd, h);
		yEnd = y + h + kerf;
	});
	offcut(trim, yEnd, xMax - trim, yMax - yEnd);
	const area = placements.reduce((a, p) => a + p.wM * p.hM, 0);
	return {
		materialName,
		index,
		lengthM: L,
		widthM: Wd,
		placements,
		cuts,
		offcuts,
		yield: area / (L * Wd)
	};
}
