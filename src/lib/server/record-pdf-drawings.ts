/**
 * The record's measured drawings as PDF vector paths: the shelf in elevation with its sag drawn
 * larger than scale (and the factor written on it), and the case's front elevation from the same
 * layout the screen draws. Dimension lines end in arrowheads; verdicts are words, not colour alone.
 */
import type PDFKit from 'pdfkit';
import type { ShelfResult } from '$lib/engine';
import type { CaseResult } from '$lib/engine/case/types';
import { layoutElevation } from '$lib/components/case-elevation/geometry';
import { shelfVerdicts } from '$lib/case-designer/shelf-verdicts';
import type { CaseDesign } from '$lib/schemas/case';

export interface Pen {
	doc: PDFKit.PDFDocument;
	left: number;
	width: number;
	ink: string;
	soft: string;
	pencil: string;
}

function arrowhead(pen: Pen, x: number, y: number, dx: number, dy: number) {
	const l = Math.hypot(dx, dy) || 1;
	const [ux, uy] = [dx / l, dy / l];
	pen.doc
		.moveTo(x, y)
		.lineTo(x - 6 * ux - 2.2 * uy, y - 6 * uy + 2.2 * ux)
		.lineTo(x - 6 * ux + 2.2 * uy, y - 6 * uy - 2.2 * ux)
		.closePath()
		.fillColor(pen.ink)
		.fill();
}

/** A dimension line between two points with arrowheads at both ends and its text beside it. */
function dimension(
	pen: Pen,
	x1: number,
	y1: number,
	x2: number,
	y2: number,
	text: string,
	textAbove = false
) {
	const { doc } = pen;
	doc.moveTo(x1, y1).lineTo(x2, y2).lineWidth(0.6).strokeColor(pen.ink).stroke();
	arrowhead(pen, x1, y1, x1 - x2, y1 - y2);
	arrowhead(pen, x2, y2, x2 - x1, y2 - y1);
	doc.font('text').fontSize(8.5).fillColor(pen.ink);
	const w = doc.widthOfString(text);
	if (y1 === y2)
		doc.text(text, (x1 + x2) / 2 - w / 2, textAbove ? y1 - 12 : y1 + 3, { lineBreak: false });
	else doc.text(text, x1 - w - 5, (y1 + y2) / 2 - 4, { lineBreak: false });
}

/** The shelf: supports, the built band dashed, the loaded band sagging, loads, span and sag. */
export function drawShelf(pen: Pen, r: ShelfResult, input: unknown, len: (m: number) => string) {
	const { doc } = pen;
	const top = doc.y + 14;
	const x0 = pen.left + 20;
	const W = pen.width - 120;
	const sx = W / r.span;
	const thick = Math.max(
		5,
		Math.min(14, ((input as { thickness?: number }).thickness ?? 0.019) * sx)
	);
	const maxSag = Math.max(...r.curve.map(([, s]) => s), 1e-9);
	const sagPx = 26;
	const exaggeration = sagPx / maxSag / sx;
	const shelfY = top + 26;
	const xOf = (m: number) => x0 + m * sx;
	const yOf = (s: number) => shelfY + (s / maxSag) * sagPx;

	// loads: arrows down onto the shelf
	const arrows = r.curve.length > 1 ? [0.1, 0.3, 0.5, 0.7, 0.9].map((f) => f * r.span) : [];
	for (const m of arrows) {
		doc
			.moveTo(xOf(m), top)
			.lineTo(xOf(m), shelfY - 4)
			.lineWidth(0.6)
			.strokeColor(pen.soft)
			.stroke();
		arrowhead(pen, xOf(m), shelfY - 3, 0, 1);
	}
	// the shelf as built, dashed
	doc
		.rect(x0, shelfY, W, thick)
		.dash(2, { space: 2 })
		.lineWidth(0.5)
		.strokeColor(pen.soft)
		.stroke();
	doc.undash();
	// the loaded shelf: the curve, and the same offset by the thickness
	const pts = r.curve.map(([x, s]) => [xOf(x), yOf(s)] as const);
	doc.moveTo(pts[0][0], pts[0][1]);
	for (const [x, y] of pts.slice(1)) doc.lineTo(x, y);
	for (const [x, y] of [...pts].reverse()) doc.lineTo(x, y + thick);
	doc.closePath().lineWidth(1).fillColor('#e8e2d4').strokeColor(pen.ink).fillAndStroke();
	// supports: small triangles under the shelf
	for (const m of r.supports) {
		const x = xOf(m);
		const y = shelfY + thick + 1;
		doc
			.moveTo(x, y)
			.lineTo(x - 6, y + 10)
			.lineTo(x + 6, y + 10)
			.closePath()
			.fillColor(pen.ink)
			.fill();
	}
	// the span, and the sag marked where it is greatest
	const dimY = shelfY + thick + sagPx + 22;
	dimension(pen, x0, dimY, x0 + W, dimY, `span ${len(r.span)}`);
	const sagX = xOf(r.sag.at);
	doc
		.font('bold')
		.fontSize(8.5)
		.fillColor(r.limit.pass ? pen.ink : pen.pencil)
		.text(
			`sags ${len(r.sag[r.sag.checked])} ${r.sag.checked === 'longTerm' ? 'in the long run' : 'when loaded'} (${r.limit.pass ? 'passes' : 'does not pass'})`,
			Math.min(sagX + 8, x0 + W - 150),
			shelfY + thick + sagPx + 2,
			{ width: 200, lineBreak: false }
		);
	doc
		.font('text')
		.fontSize(8)
		.fillColor(pen.soft)
		.text(
			`Sag drawn about ${Math.round(exaggeration)} times larger than scale. ${r.limit.name} allows ${len(r.limit.allowed)}.`,
			pen.left,
			dimY + 16,
			{ width: pen.width }
		);
	doc.y = dimY + 32;
}

/** The case's front elevation, to scale, every shelf's verdict written beside it. */
export function drawCase(pen: Pen, input: unknown, r: CaseResult, len: (m: number) => string) {
	const { doc } = pen;
	const g = layoutElevation(input as CaseDesign);
	const fit = Math.min(230 / g.height, pen.width / g.width);
	const ox = pen.left;
	const oy = doc.y + 12;
	const X = (x: number) => ox + x * fit;
	const Y = (y: number) => oy + y * fit;
	const box = (b: { x: number; y: number; w: number; h: number }, fill?: string) => {
		doc
			.rect(X(b.x), Y(b.y), b.w * fit, b.h * fit)
			.lineWidth(0.7)
			.strokeColor(pen.ink);
		if (fill) doc.fillColor(fill).fillAndStroke();
		else doc.stroke();
	};
	box(g.outline);
	for (const s of g.sides) box(s, '#e8e2d4');
	for (const s of g.shelves) box(s.box, '#e8e2d4');
	if (g.base) box(g.base, '#d9d2c1');
	doc
		.moveTo(X(g.outline.x - 20), Y(g.floorY))
		.lineTo(X(g.outline.x + g.outline.w + 20), Y(g.floorY))
		.lineWidth(1)
		.strokeColor(pen.ink)
		.stroke();
	const w = g.dims.width;
	dimension(pen, X(w.x1), Y(w.y), X(w.x2), Y(w.y), len(w.m), true);
	const h = g.dims.height;
	dimension(pen, X(h.x), Y(h.y1), X(h.x), Y(h.y2), len(h.m));
	const verdicts = shelfVerdicts(r);
	for (const s of g.shelves) {
		const v = verdicts[s.key];
		if (!v) continue;
		doc
			.font(v.pass ? 'text' : 'bold')
			.fontSize(7.5)
			.fillColor(v.pass ? pen.ink : pen.pencil)
			.text(v.text, X(g.outline.x + g.outline.w) + 6, Y(s.box.y) - 2, {
				width: 160,
				lineBreak: false
			});
	}
	doc.y = Y(g.height) + 8;
}
