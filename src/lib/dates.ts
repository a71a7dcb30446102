/**
 * Dates said one way everywhere (lists, history, tokens, invitations): the ISO 8601 calendar date
 * (Canada's all-numeric date, CSA Z234.5) and a 24-hour time in UTC with the zone named. Written
 * by hand, not by Intl, so the page the server renders and the page the browser hydrates read the
 * same whatever either's locale data.
 */
type When = Date | string | number;
const toDate = (when: When) => (when instanceof Date ? when : new Date(when));
const two = (n: number) => String(n).padStart(2, '0');

/** "2026-12-02" */
export function formatDay(when: When): string {
	const d = toDate(when);
	if (Number.isNaN(d.getTime())) return '—';
	return `${d.getUTCFullYear()}-${two(d.getUTCMonth() + 1)}-${two(d.getUTCDate())}`;
}

/** "2026-12-02 16:05 UTC" */
export function formatMoment(when: When): string {
	const d = toDate(when);
	if (Number.isNaN(d.getTime())) return '—';
	return `${formatDay(d)} ${two(d.getUTCHours())}:${two(d.getUTCMinutes())} UTC`;
}
