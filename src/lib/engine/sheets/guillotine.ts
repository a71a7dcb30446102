/**
 * Whether a layout can be cut with edge-to-edge straight cuts only (what a track saw and a table
 * saw can do): some straight line crosses the whole piece without passing through a part and
 * splits the parts in two groups, and each side again, down to single parts.
 */
interface Rect {
	xM: number;
	yM: number;
	wM: number;
	hM: number;
}

const EPS = 1e-9;

export function isGuillotine(rects: Rect[]): boolean {
	if (rects.length <= 1) return true;
	for (const axis of ['x', 'y'] as const) {
		const start = (r: Rect) => (axis === 'x' ? r.xM : r.yM);
		const end = (r: Rect) => start(r) + (axis === 'x' ? r.wM : r.hM);
		const sorted = [...rects].sort((a, b) => start(a) - start(b));
		let reach = -Infinity;
		for (let i = 0; i < sorted.length - 1; i++) {
			reach = Math.max(reach, end(sorted[i]));
			// a cut line at `reach` crosses no part when the next part starts at or past it
			if (start(sorted[i + 1]) >= reach - EPS)
				return isGuillotine(sorted.slice(0, i + 1)) && isGuillotine(sorted.slice(i + 1));
		}
	}
	return false;
}

/** The smallest gap between two parts that face each other across a cut (for the kerf check):
 * for each pair, the larger of the gaps along x and along y (negative where they overlap). */
export function smallestGap(rects: Rect[]): number {
	let min = Infinity;
	for (let i = 0; i < rects.length; i++)
		for (let j = i + 1; j < rects.length; j++) {
			const a = rects[i];
			const b = rects[j];
			const gx = Math.max(b.xM - (a.xM + a.wM), a.xM - (b.xM + b.wM));
			const gy = Math.max(b.yM - (a.yM + a.hM), a.yM - (b.yM + b.hM));
			min = Math.min(min, Math.max(gx, gy));
		}
	return min;
}
