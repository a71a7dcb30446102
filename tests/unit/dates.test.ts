import { describe, expect, it } from 'vitest';
import { formatDay, formatMoment } from '../../src/lib/dates';

describe('one date formatter', () => {
	it('writes the ISO calendar date and a 24-hour UTC time, whatever the input form', () => {
		const at = '2026-12-02T16:05:09.123Z';
		expect(formatDay(at)).toBe('2026-12-02');
		expect(formatDay(new Date(at))).toBe('2026-12-02');
		expect(formatDay(Date.parse(at))).toBe('2026-12-02');
		expect(formatMoment(at)).toBe('2026-12-02 16:05 UTC');
		// just after midnight UTC is still that day, wherever the server or browser runs
		expect(formatDay('2027-01-01T00:00:00Z')).toBe('2027-01-01');
	});

	it('says a date it cannot read is missing rather than "Invalid Date"', () => {
		expect(formatDay('not a date')).toBe('—');
		expect(formatMoment(Number.NaN)).toBe('—');
	});
});

describe('every date on screen, in records and in PDFs goes through the one formatter', () => {
	it('no screen, record or server module formats a date itself (locale strings or ISO slices)', async () => {
		const { readdirSync, readFileSync, statSync } = await import('node:fs');
		const { join } = await import('node:path');
		const files: string[] = [];
		const walk = (dir: string) => {
			for (const name of readdirSync(dir)) {
				const path = join(dir, name);
				if (statSync(path).isDirectory()) walk(path);
				else if (/\.(ts|svelte)$/.test(name)) files.push(path);
			}
		};
		walk('src');
		// issue 15 item 12: three date styles were on screen (en-CA, the browser's medium, ISO slices)
		const own = /toLocaleDateString|toLocaleTimeString|dateStyle|toISOString\(\)\.slice\(0, 10\)/;
		const offenders = files.filter(
			(f) => !f.endsWith(join('lib', 'dates.ts')) && own.test(readFileSync(f, 'utf8'))
		);
		expect(offenders).toEqual([]);
		expect(files.length).toBeGreaterThan(100);
	});
});
