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
