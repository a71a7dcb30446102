/**
 * The record as a PDF, drawn on the server with pdfkit: the same words as the record page, the
 * drawings as vector paths, in the app's own typeface (IBM Plex Sans from the @fontsource package
 * the screens use). Letter for inch users, A4 for millimetre users.
 */
import PDFDocument from 'pdfkit';
import { createRequire } from 'node:module';
import { formatLength, type ShelfResult } from '$lib/engine';
import { formatDay } from '$lib/dates';
import type { CaseResult } from '$lib/engine/case/types';
import type { RecordDoc, RecordItem } from './records';
import { drawCase, drawShelf, type Pen } from './record-pdf-drawings';

const require = createRequire(import.meta.url);
const FONT = {
	text: require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff'),
	bold: require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff')
};
const INK = '#2a2926';
const SOFT = '#55524b';
const PENCIL = '#b3401a';

/** Characters the shipped latin subset lacks, in words it has. */
function plain(text: string) {
	return text
		.replace(/≈/g, '~')
		.replace(/†/g, '*')
		.replace(/[✓✗]/g, '')
		.replace(/→/g, '->')
		.replace(/≤/g, '<=')
		.replace(/≥/g, '>=');
}

export function renderRecordPdf(record: RecordDoc): Promise<Buffer> {
	const doc = new PDFDocument({
		size: record.unit === 'mm' ? 'A4' : 'LETTER',
		margins: { top: 54, bottom: 60, left: 56, right: 56 },
		bufferPages: true,
		info: {
			Title: `${record.project.name}: record`,
			Author: record.shop,
			Subject: 'Spanwright record (engineering estimates)'
		}
	});
	doc.registerFont('text', FONT.text);
	doc.registerFont('bold', FONT.bold);
	const chunks: Buffer[] = [];
	doc.on('data', (c: Buffer) => chunks.push(c));
	const done = new Promise<Buffer>((resolve, reject) => {
		doc.on('end', () => resolve(Buffer.concat(chunks)));
		doc.on('error', reject);
	});

	const width = doc.page.width - 112;
	const left = 56;
	const bottom = () => doc.page.height - 60;
	const room = (h: number) => {
		if (doc.y + h > bottom()) doc.addPage();
	};
	const say = (
		text: string,
		o: { font?: string; size?: number; color?: string; gap?: number } = {}
	) =>
		doc
			.font(o.font ?? 'text')
			.fontSize(o.size ?? 10.5)
			.fillColor(o.color ?? INK)
			.text(plain(text), left, doc.y, { width, paragraphGap: o.gap ?? 4 });
	const heading = (text: string, size = 12) => {
		room(size * 3);
		doc.moveDown(0.6);
		say(text, { font: 'bold', size });
	};
	const list = (items: string[], numbered: boolean) => {
		items.forEach((item, i) => {
			room(24);
			const mark = numbered ? `${i + 1}.` : '•';
			const y = doc.y;
			doc.font('text').fontSize(10.5).fillColor(INK).text(mark, left, y, { width: 18 });
			doc.text(plain(item), left + 18, y, { width: width - 18, paragraphGap: 3 });
		});
	};
	const pen: Pen = { doc, left, width, ink: INK, soft: SOFT, pencil: PENCIL };
	const len = (m: number) => formatLength(m, { unit: record.unit });

	// the head: shop, project, client, date
	say(record.shop.toUpperCase(), { size: 9, color: SOFT });
	say(record.project.name, { font: 'bold', size: 20 });
	say(
		`${record.project.client ? `For ${record.project.client} · ` : ''}Record of ${formatDay(record.date)}`,
		{ color: SOFT }
	);
	doc.moveDown(0.5);
	for (const c of record.cautions) {
		const y = doc.y;
		say(c, { size: 10 });
		doc
			.moveTo(left - 8, y)
			.lineTo(left - 8, doc.y)
			.lineWidth(2)
			.strokeColor(INK)
			.stroke();
	}
	if (!record.items.length) say('Nothing has been checked and saved in this project yet.');

	for (const item of record.items) writeItem(item);

	if (record.notes.length) {
		heading('Notes: where the figures come from', 13);
		record.notes.forEach((n) => {
			room(24);
			say(`${n.n}. ${n.text}${n.unverified ? ' *' : ''}`, { size: 9 });
		});
		if (record.notes.some((n) => n.unverified))
			say(
				'* A figure recalled or not yet checked against a copy of its source: treat it with care.',
				{
					size: 9,
					color: SOFT
				}
			);
	}
	if (record.glossary.length) {
		heading('Words used', 13);
		for (const [term, meaning] of record.glossary) say(`${term}: ${meaning}`, { size: 9.5 });
	}

	// every page: what it is, and where it sits
	const range = doc.bufferedPageRange();
	for (let i = 0; i < range.count; i++) {
		doc.switchToPage(range.start + i);
		const y = doc.page.height - 40;
		doc.page.margins.bottom = 0;
		doc
			.font('text')
			.fontSize(8)
			.fillColor(SOFT)
			.text(
				plain(
					`${record.shop} · ${record.project.name} · Spanwright record · page ${i + 1} of ${range.count}`
				),
				left,
				y,
				{ width, lineBreak: false }
			);
	}
	doc.end();
	return done;

	function writeItem(item: RecordItem) {
		room(120);
		doc.moveDown(1);
		doc
			.moveTo(left, doc.y)
			.lineTo(left + width, doc.y)
			.lineWidth(0.5)
			.strokeColor(SOFT)
			.stroke();
		doc.moveDown(0.6);
		say(item.kindLabel.toUpperCase(), { size: 8.5, color: SOFT });
		say(item.name, { font: 'bold', size: 15 });
		const word = item.pass === null ? '' : item.pass ? 'Passes. ' : 'Does not pass. ';
		doc
			.font('bold')
			.fontSize(11.5)
			.fillColor(item.pass === false ? PENCIL : INK)
			.text(word, left, doc.y, { width, continued: true })
			.font('text')
			.fillColor(INK)
			.text(plain(item.verdict), { paragraphGap: 6 });
		if (item.kind === 'shelf') {
			room(150);
			drawShelf(pen, item.result as ShelfResult, item.input, len);
		} else if (item.kind === 'case') {
			room(250);
			drawCase(pen, item.input, item.result as CaseResult, len);
		}
		if (item.inputs.length) {
			heading('What was checked', 11);
			for (const [label, value] of item.inputs) {
				room(16);
				const y = doc.y;
				doc.font('bold').fontSize(9.5).fillColor(SOFT).text(plain(label), left, y, { width: 130 });
				const after = doc.y;
				doc
					.font('text')
					.fillColor(INK)
					.text(plain(value), left + 140, y, { width: width - 140, paragraphGap: 2 });
				doc.y = Math.max(doc.y, after);
			}
		}
		if (item.steps.length) {
			heading('What to do', 11);
			list(item.steps, true);
		}
		if (item.cautions.length) {
			heading('Cautions', 11);
			list(item.cautions, false);
		}
		doc.moveDown(0.4);
		say(
			`${item.notes.length ? `Sources: notes ${item.notes.join(', ')}. ` : ''}Version ${item.version}, saved ${formatDay(item.updatedAt)}, computed by engine ${item.engineVersion}.`,
			{ size: 8.5, color: SOFT }
		);
	}
}
