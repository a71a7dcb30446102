// The record a client reads (per project and per analysis), its PDF read back with pdftotext, and
// the demo client's reach: her own project only.
import { beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync } from 'node:fs';
import { useTempDb } from './support/db';
import { ensurePoppler, pdfPagePng, pdfText } from './support/pdf';
import { seedDemo } from '../../src/lib/server/demo/seed';
import { analysisRecord, projectRecord } from '../../src/lib/server/records';
import { renderRecordPdf } from '../../src/lib/server/record-pdf';
import { formatLength, type ShelfResult } from '../../src/lib/engine';
import type { CaseResult } from '../../src/lib/engine/case/types';
import type { Actor } from '../../src/lib/server/access';

useTempDb();
beforeAll(() => ensurePoppler(), 120_000);

type Demo = Awaited<ReturnType<typeof seedDemo>>;
const actorOf = (demo: Demo, role: string): Actor => {
	const u = demo.users.find((x) => x.role === role)!;
	return { id: u.id, email: u.email, name: u.name, via: 'session' };
};
const inches = (m: number) => formatLength(m, { unit: 'frac16' });

describe('the record', () => {
	it('says the shelf verdict in one plain sentence, with its figures, notes and glossary', async () => {
		const demo = await seedDemo();
		const dana = actorOf(demo, 'client');
		const library = demo.projectIds['Whitlock library wall'];
		const { record, role } = await projectRecord(dana, library);
		expect(role).toBe('client');
		expect(record.shop).toBe('Quillfeather Casework');
		expect(record.project.client).toBe('Dana Whitlock');
		expect(record.items.map((i) => i.name)).toEqual([
			'Left bookcase, middle shelf',
			'Shelf stock for the library wall',
			'Fixed shelf to case side',
			'Living-room wall, four units'
		]);
		// the demo wall fails until its cases are fixed to the wall: the record says so and lists
		// the anchoring steps of its cases
		const wall = record.items[3];
		expect(wall.pass).toBe(false);
		expect(wall.verdict).toMatch(/checks of this wall do not pass; the worst is/);
		expect(wall.steps.some((s) => /wall|stud/i.test(s))).toBe(true);
		const shelf = record.items[0];
		const r = shelf.result as ShelfResult;
		// the demo's oak-nosed shelf under L/144 (the engine's figures, written out)
		expect(r.limit.name).toBe('L/144');
		expect(shelf.verdict).toBe(
			`This shelf sags about ${inches(r.sag.instant)} when loaded, and about ${inches(r.sag.longTerm)} in the long run under the same load. ` +
				`That is within the L/144 limit (${inches(r.limit.allowed)}), with ${Math.round(r.limit.margin * 100)}% to spare.`
		);
		expect(shelf.inputs.find(([label]) => label === 'Span')?.[1]).toBe(inches(r.span));
		// every source is a numbered note; figures recalled or unverified are marked
		expect(shelf.notes.length).toBeGreaterThan(2);
		expect(record.notes.map((n) => n.n)).toEqual(record.notes.map((_, i) => i + 1));
		expect(record.notes.find((n) => n.text === r.limit.source)).toBeTruthy();
		for (const n of record.notes)
			expect(n.unverified).toBe(/from memory|unverified|verify/i.test(n.text));
		expect(record.glossary.map(([t]) => t)).toEqual(
			expect.arrayContaining(['sag', 'span', 'limit'])
		);
		expect(record.cautions[0]).toMatch(/estimates/);
	});

	it('shows the demo client nothing of the shop’s other clients', async () => {
		const demo = await seedDemo();
		const dana = actorOf(demo, 'client');
		for (const name of ['Harbour Street school reading nook', 'Kiln Lane pantry'])
			await expect(projectRecord(dana, demo.projectIds[name])).rejects.toMatchObject({
				status: 404
			});
		const school = demo.projectIds['Harbour Street school reading nook'];
		await expect(analysisRecord(dana, school, demo.analysisIds[4])).rejects.toMatchObject({
			status: 404
		});
	});

	it('renders a tall case as a PDF whose text holds the verdict, the anchoring steps and the cautions', async () => {
		const demo = await seedDemo();
		const ines = actorOf(demo, 'owner');
		const school = demo.projectIds['Harbour Street school reading nook'];
		const { record } = await analysisRecord(ines, school, demo.analysisIds[4]);
		const item = record.items[0];
		const r = item.result as CaseResult;
		const pdf = await renderRecordPdf(record);
		expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
		const text = pdfText(pdf);
		const squash = (s: string) => s.replace(/\s+/g, ' ');
		expect(text).toContain('Quillfeather Casework'.toUpperCase());
		expect(text).toContain('Harbour Street school reading nook');
		expect(text).toContain(squash(item.verdict));
		expect(r.stability.anchoring.recommendations.length).toBeGreaterThan(0);
		for (const step of r.stability.anchoring.recommendations) expect(text).toContain(squash(step));
		for (const caution of item.cautions) expect(text).toContain(squash(caution));
		expect(text).toContain(squash(record.cautions[0]));
		expect(text).toContain(`computed by engine ${item.engineVersion}`);
		// the drawing's figures: the case's overall height, in the reader's inches
		expect(text).toContain(inches((item.input as { height: number }).height));
		copyFileSync(pdfPagePng(pdf, 1, 'case-record'), '/tmp/spanwright-case-record-p1.png');
	});

	it('renders a shelf record PDF with the sag figures and the limit', async () => {
		const demo = await seedDemo();
		const dana = actorOf(demo, 'client');
		const library = demo.projectIds['Whitlock library wall'];
		const { record } = await analysisRecord(dana, library, demo.analysisIds[0]);
		const r = record.items[0].result as ShelfResult;
		const text = pdfText(await renderRecordPdf(record));
		expect(text).toContain('Passes.');
		expect(text).toContain(`sags about ${inches(r.sag.instant)} when loaded`);
		expect(text).toContain(`in the long run`);
		expect(text).toContain(`span ${inches(r.span)}`);
		expect(text).toContain(`${r.limit.name} allows ${inches(r.limit.allowed)}`);
		expect(text).toContain('For Dana Whitlock');
		copyFileSync(
			pdfPagePng(await renderRecordPdf(record), 1, 'shelf-record'),
			'/tmp/spanwright-shelf-record-p1.png'
		);
	});
});
