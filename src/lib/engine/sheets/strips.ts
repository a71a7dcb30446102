/**
 * Parts packed onto sheets in three stages a track saw and a table saw can follow: strips ripped
 * off the sheet along its length, stacks crosscut off a strip, parts ripped off a stack (and
 * crosscut to length where a part is shorter than its stack). A general-purpose shelf packer
 * (@mapbox/shelf-pack) fills each strip, turned on its side so that its shelves are our stacks;
 * the rules of the shop are ours: the saw kerf around every part, grain-locked parts never turned,
 * strips as tall as their first (tallest) part, first fit over the sheets already started.
 * Sizes are whole micrometres so that equal sizes compare equal.
 */
import ShelfPack from '@mapbox/shelf-pack';

export interface Item {
	group: number;
	mark: string;
	/** along the part's length and across it */
	l: number;
	w: number;
	/** the grain must run along the sheet's length */
	locked: boolean;
}

/** A part as laid: x along the sheet's length, y across. */
interface Laid {
	item: Item;
	x: number;
	y: number;
	turned: boolean;
}

interface PackedPart extends Laid {
	/** from the corner of the usable (trimmed) sheet */
	px: number;
	py: number;
}

interface Stack {
	/** from the usable sheet's corner, and its width along the sheet (its first part's length) */
	x: number;
	w: number;
	parts: PackedPart[];
}

export interface Strip {
	y: number;
	h: number;
	stacks: Stack[];
	/** the shelf packer working across the strip: its width is the strip's height */
	pack: ShelfPack;
}

export interface PackedSheet {
	strips: Strip[];
	/** height used by the strips, kerfs included */
	used: number;
}

export type Lie = 'narrow' | 'wide';
export type Order = 'height' | 'area' | 'length';

/** Both ways a part can lie on the sheet, the plan's choice first; a locked part lies one way. */
export function ways(it: Item, lie: Lie, L: number, W: number): Laid[] {
	const along: Laid = { item: it, x: it.l, y: it.w, turned: false };
	const across: Laid = { item: it, x: it.w, y: it.l, turned: true };
	if (it.locked) return [along];
	const fits = (p: Laid) => p.x <= L && p.y <= W;
	const both = [along, across].filter(fits);
	if (both.length < 2) return both.length ? both : [along];
	// narrow: the part's smaller side across the strip (lower strips); wide: the other way
	return along.y <= across.y === (lie === 'narrow') ? both : [across, along];
}

/**
 * Pack the parts onto as few sheets as this plan can; parts too large for a sheet come back apart.
 * L and W are the usable sheet (less its trim), kerf is added after every part.
 */
export function packStrips(
	items: Item[],
	lie: Lie,
	order: Order,
	L: number,
	W: number,
	kerf: number
): { sheets: PackedSheet[]; tooBig: Item[] } {
	const laid = items.map((it) => ways(it, lie, L, W));
	const key = (p: Laid) =>
		order === 'height' ? [p.y, p.x] : order === 'area' ? [p.x * p.y, p.y] : [p.x, p.y];
	const idx = laid.map((_, i) => i);
	idx.sort((a, b) => {
		const ka = key(laid[a][0]);
		const kb = key(laid[b][0]);
		return kb[0] - ka[0] || kb[1] - ka[1] || a - b;
	});
	const sheets: PackedSheet[] = [];
	const tooBig: Item[] = [];
	for (const i of idx) {
		const options = laid[i];
		if (!options.some((p) => p.x <= L && p.y <= W)) {
			tooBig.push(options[0].item);
			continue;
		}
		if (!intoStrips(sheets, options, kerf) && !newStrip(sheets, options, L, W, kerf)) {
			sheets.push({ strips: [], used: 0 });
			newStrip(sheets, options, L, W, kerf);
		}
	}
	return { sheets, tooBig };
}

/** First fit into a strip already ripped: onto a stack, or as a new stack along the strip. */
function intoStrips(sheets: PackedSheet[], options: Laid[], kerf: number): boolean {
	for (const sheet of sheets)
		for (const strip of sheet.strips)
			for (const p of options) {
				if (p.y > strip.h) continue;
				const bin = strip.pack.packOne(p.y + kerf, p.x + kerf);
				if (bin) {
					place(strip, p, bin.y, bin.x);
					return true;
				}
			}
	return false;
}

/** A new strip as tall as the part, on the first sheet with room below its last strip. */
function newStrip(
	sheets: PackedSheet[],
	options: Laid[],
	L: number,
	W: number,
	kerf: number
): boolean {
	for (const sheet of sheets)
		for (const p of options) {
			if (p.x > L || sheet.used + p.y > W) continue;
			const strip: Strip = {
				y: sheet.used,
				h: p.y,
				stacks: [],
				pack: new ShelfPack(p.y + kerf, L + kerf, { autoResize: false })
			};
			const bin = strip.pack.packOne(p.y + kerf, p.x + kerf)!;
			sheet.strips.push(strip);
			sheet.used += p.y + kerf;
			place(strip, p, bin.y, bin.x);
			return true;
		}
	return false;
}

function place(strip: Strip, p: Laid, alongX: number, acrossY: number) {
	let stack = strip.stacks.find((s) => s.x === alongX);
	if (!stack) {
		stack = { x: alongX, w: p.x, parts: [] };
		strip.stacks.push(stack);
		strip.stacks.sort((a, b) => a.x - b.x);
	}
	// the packer's shelf is as wide as its first part (and its kerf): no later part is longer
	stack.w = Math.max(stack.w, p.x);
	stack.parts.push({ ...p, px: alongX, py: strip.y + acrossY });
	stack.parts.sort((a, b) => a.py - b.py);
}

/**
 * No fewer sheets can hold the parts than this, whatever the layout: along any line across a
 * sheet, the parts it crosses lie side by side with a kerf between them, so no three parts wider
 * than a third of the sheet (less two kerfs) and no two, one of them wider than two thirds, meet
 * the same line. Weighing those parts ½ and 1, the weighted lengths of one sheet's parts add up to
 * no more than its length; a part that may turn counts the way that weighs least.
 */
export function crossingBound(items: Item[], L: number, W: number, kerf: number): number {
	const third = (W - 2 * kerf) / 3;
	const twoThirds = (2 * W - kerf) / 3;
	const weight = (y: number) => (y > twoThirds ? 1 : y > third ? 0.5 : 0);
	let sum = 0;
	for (const it of items) {
		const options = [{ x: it.l, y: it.w }, ...(it.locked ? [] : [{ x: it.w, y: it.l }])].filter(
			(p) => p.x <= L && p.y <= W
		);
		if (options.length) sum += Math.min(...options.map((p) => weight(p.y) * p.x));
	}
	return Math.ceil(sum / L - 1e-9);
}
