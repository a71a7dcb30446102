import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** pdftotext and pdftoppm (Debian's poppler-utils), installed when missing as CI does. */
export function ensurePoppler() {
	execFileSync('bash', ['tests/support/ensure-poppler.sh'], { stdio: 'inherit' });
}

/** The PDF's text as pdftotext reads it, runs of white space made single spaces. */
export function pdfText(pdf: Buffer) {
	const dir = mkdtempSync(join(tmpdir(), 'spanwright-pdf-'));
	const file = join(dir, 'record.pdf');
	writeFileSync(file, pdf);
	return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-']).toString().replace(/\s+/g, ' ');
}

/** Render page `page` of the PDF to a PNG (150 dpi) and give back its path, to look at. */
export function pdfPagePng(pdf: Buffer, page = 1, name = 'record') {
	const dir = mkdtempSync(join(tmpdir(), 'spanwright-pdf-'));
	const file = join(dir, `${name}.pdf`);
	writeFileSync(file, pdf);
	const out = join(dir, name);
	execFileSync('pdftoppm', [
		'-png',
		'-r',
		'150',
		'-f',
		String(page),
		'-l',
		String(page),
		file,
		out
	]);
	const png = readdirSync(dir).find((f) => f.endsWith('.png'))!;
	readFileSync(join(dir, png));
	return join(dir, png);
}
