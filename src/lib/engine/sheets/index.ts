/**
 * Sheet layouts a track saw and a table saw can follow. Parts are packed in strips across the
 * sheet (a general-purpose shelf packer places them); the rules of the shop are ours: every part
 * at its rough size plus a saw kerf, a trim at the factory edges, the sheet's grain along its
 * length, parts that must keep their grain never turned, and only edge-to-edge cuts: rip a strip,
 * crosscut its parts, rip a part narrower than its strip. The cut order follows from the strips.
 */
import ShelfPack from '@mapbox/shelf-pack';
import type { CutGroup } from '../cutlist';
import { METRES_PER_INCH } from '../units/length';

export interface SheetStock {
	materialName: string;
	/** along the sheet's grain (8' of a 4×8 sheet) */
	lengthM: number;
	widthM: number;
	/** keep every part's grain along the sheet's, for looks (parts that carry load always keep it) */
	keepGrain: boolean;
}

export interface SheetOptions {
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
	/** trim a factory edge; rip a strip off the sheet along its length; crosscut a part off its
	 * strip; rip a part narrower than its strip to width */
	kind: 'trim' | 'rip-strip' | 'crosscut' | 'rip-part';
	/** the strip (1 up) the cut belongs to, and the part's mark */
	strip?: number;
	mark?: string;
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
		/** no fewer sheets can hold the parts: their area over one sheet's (rounded up) */
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

interface Item {
	group: number;
	mark: string;
	l: number;
	w: number;
	locked: boolean;
}

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
			lowerBound: Math.ceil(partArea / sheetArea - 1e-9)
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
	// Several plans, keep the one with the fewest sheets (then the emptiest last sheet): free parts
	// lie narrow side across the strip or wide side across; parts go in by strip height or by area.
	let best: ReturnType<typeof packAll> | null = null;
	for (const lie of ['narrow', 'wide'] as const)
		for (const order of ['height', 'area'] as const) {
			const trial = packAll(items, lie, order, L, W, kerf, trim);
			if (
				!best ||
				trial.packs.length < best.packs.length ||
				(trial.packs.length === best.packs.length && trial.lastArea < best.lastArea)
			)
				best = trial;
		}
	const { packs, placed, tooBig } = best!;
	for (const [mark, count] of tooBig)
		notOnSheets.push({
			mark,
			count,
			reason: `larger than a ${materialName} sheet less its trim (or its grain cannot turn to fit)`
		});
	return packs.map((p, i) => layoutOf(materialName, i, stock, p, placed[i], o));
}

function packAll(
	items: Item[],
	lie: 'narrow' | 'wide',
	order: 'height' | 'area',
	L: number,
	W: number,
	kerf: number,
	trim: number
) {
	// grain-locked parts run along the sheet; a free part turns when it fits only turned, or to lie
	// as the plan asks
	const laid = items.map((it) => {
		const along = { ...it, x: it.l, y: it.w, turned: false };
		const across = { ...it, x: it.w, y: it.l, turned: true };
		if (it.locked) return along;
		const fitsAlong = along.x <= L && along.y <= W;
		const fitsAcross = across.x <= L && across.y <= W;
		if (fitsAlong && fitsAcross) return along.y <= across.y === (lie === 'narrow') ? along : across;
		return fitsAcross ? across : along;
	});
	laid.sort((a, b) =>
		order === 'height' ? b.y - a.y || b.x - a.x : b.x * b.y - a.x * a.y || b.y - a.y
	);
	const packs: ShelfPack[] = [];
	const placed: Placement[][] = [];
	const tooBig = new Map<string, number>();
	for (const it of laid) {
		if (it.x > L || it.y > W) {
			tooBig.set(it.mark, (tooBig.get(it.mark) ?? 0) + 1);
			continue;
		}
		let bin = null;
		let s = 0;
		for (; s < packs.length && !bin; s++) bin = packs[s].packOne(it.x + kerf, it.y + kerf);
		if (!bin) {
			packs.push(new ShelfPack(L + kerf, W + kerf, { autoResize: false }));
			placed.push([]);
			s = packs.length;
			bin = packs[s - 1].packOne(it.x + kerf, it.y + kerf)!;
		}
		placed[s - 1].push({
			mark: it.mark,
			group: it.group,
			xM: si(bin.x + trim),
			yM: si(bin.y + trim),
			wM: si(it.x),
			hM: si(it.y),
			turned: it.turned
		});
	}
	const last = packs[packs.length - 1];
	const lastArea = last ? last.shelves.reduce((a, sh) => a + sh.h, 0) : 0;
	return { packs, placed, tooBig, lastArea };
}

/** The cuts in order and the leftovers, from the strips the packer made. */
function layoutOf(
	materialName: string,
	index: number,
	stock: SheetStock,
	pack: ShelfPack,
	placements: Placement[],
	o: SheetOptions
): SheetLayout {
	const kerf = o.kerfM;
	const trim = o.trimM;
	const L = stock.lengthM;
	const Wd = stock.widthM;
	const cuts: Cut[] = [];
	const offcuts: Offcut[] = [];
	const xMax = L - trim;
	const yMax = Wd - trim;
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
	pack.shelves.forEach((shelf, k) => {
		const y = si(shelf.y) + trim;
		const inStrip = placements.filter((p) => Math.abs(p.yM - y) < 1e-7).sort((a, b) => a.xM - b.xM);
		const h = Math.max(...inStrip.map((p) => p.hM));
		cuts.push({
			kind: 'rip-strip',
			strip: k + 1,
			sizeM: h,
			line: { x0: trim, y0: y + h + kerf / 2, x1: xMax, y1: y + h + kerf / 2 }
		});
		let xEnd = trim;
		for (const p of inStrip) {
			cuts.push({
				kind: 'crosscut',
				strip: k + 1,
				mark: p.mark,
				sizeM: p.wM,
				line: { x0: p.xM + p.wM + kerf / 2, y0: y, x1: p.xM + p.wM + kerf / 2, y1: y + h }
			});
			if (p.hM < h - 1e-9) {
				cuts.push({
					kind: 'rip-part',
					strip: k + 1,
					mark: p.mark,
					sizeM: p.hM,
					line: {
						x0: p.xM,
						y0: p.yM + p.hM + kerf / 2,
						x1: p.xM + p.wM,
						y1: p.yM + p.hM + kerf / 2
					}
				});
				offcut(p.xM, p.yM + p.hM + kerf, p.wM, h - p.hM - kerf);
			}
			xEnd = p.xM + p.wM + kerf;
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
