import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { actionHref, debounce, listHref, sortHref } from '../../../src/lib/components/paged-list';

const at = (path: string) => new URL(path, 'http://localhost');

describe('a list’s state in its address', () => {
	it('sets and removes parameters, keeping the others', () => {
		const url = at('/projects?q=oak&sort=name&dir=asc&page=3');
		expect(listHref(url, { page: 4 })).toBe('/projects?q=oak&sort=name&dir=asc&page=4');
		expect(listHref(url, { q: '', page: null })).toBe('/projects?sort=name&dir=asc');
		expect(listHref(at('/projects?q=a'), { q: null })).toBe('/projects');
		// typed characters are encoded, so the link gives back exactly what was typed
		expect(listHref(at('/projects'), { q: '50% & 3/4"' })).toBe('/projects?q=50%25+%26+3%2F4%22');
	});

	it('leaves out the name of a form action the page was posted to', () => {
		const url = at('/projects/p1?/duplicate&q=oak&page=2');
		expect(listHref(url, {})).toBe('/projects/p1?q=oak&page=2');
		expect(actionHref(url, 'move')).toBe('?/move&q=oak&page=2');
		expect(actionHref(at('/projects/p1'), 'move')).toBe('?/move');
		expect(actionHref(at('/projects/p1?manage=a1&q=x'), 'move', { manage: null })).toBe(
			'?/move&q=x'
		);
	});

	it('sorting flips the same column, starts another in its natural order, on page 1', () => {
		const url = at('/projects?sort=name&dir=asc&page=2');
		const current = { sort: 'name', dir: 'asc' } as const;
		expect(sortHref(url, 'name', current)).toBe('/projects?sort=name&dir=desc');
		expect(sortHref(url, 'updated', current)).toBe('/projects?sort=updated&dir=desc');
		expect(sortHref(url, 'client', current)).toBe('/projects?sort=client&dir=asc');
		expect(sortHref(url, 'name', { sort: 'name', dir: 'desc' })).toBe(
			'/projects?sort=name&dir=asc'
		);
	});
});

describe('debounce, the search box’s pause', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('waits for a pause in typing, then runs once with the last value', async () => {
		const run = vi.fn();
		const typed = debounce(run, 150);
		typed('o');
		await vi.advanceTimersByTimeAsync(100);
		typed('oa');
		await vi.advanceTimersByTimeAsync(100);
		expect(run).not.toHaveBeenCalled();
		await vi.advanceTimersByTimeAsync(60);
		expect(run).toHaveBeenCalledTimes(1);
		expect(run).toHaveBeenCalledWith('oa');
	});

	it('a cancelled wait never runs (the form was sent by its button)', async () => {
		const run = vi.fn();
		const typed = debounce(run, 10);
		typed();
		typed.cancel();
		await vi.advanceTimersByTimeAsync(20);
		expect(run).not.toHaveBeenCalled();
	});
});
