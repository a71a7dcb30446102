import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { PagedFetch } from '../../../src/lib/components/paged-list';

describe('PagedFetch, the tables’ page fetch', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('waits for a pause in typing, then keeps the page', async () => {
		const list = new PagedFetch<{ total: number }>(150);
		const fetchPage = vi.fn(async () => ({ total: 3 }));
		list.load(fetchPage);
		await vi.advanceTimersByTimeAsync(100);
		expect(fetchPage).not.toHaveBeenCalled();
		await vi.advanceTimersByTimeAsync(60);
		expect(fetchPage).toHaveBeenCalledTimes(1);
		expect(list.result).toEqual({ total: 3 });
		expect(list.loading).toBe(false);
		expect(list.failure).toBeNull();
	});

	it('a newer query cancels the older one, whose answer is never shown', async () => {
		const list = new PagedFetch<string>(10);
		const stop = list.load(async () => 'old');
		stop(); // the effect re-ran before the pause was over
		list.load(async () => 'new');
		await vi.advanceTimersByTimeAsync(20);
		expect(list.result).toBe('new');
	});

	it('says why a page failed, and a retry is counted', async () => {
		const list = new PagedFetch<string>(0);
		list.load(async () => {
			throw new Error('the server answered 500');
		});
		await vi.advanceTimersByTimeAsync(1);
		expect(list.failure).toBe('the server answered 500');
		expect(list.loading).toBe(false);
		list.retry();
		expect(list.attempt).toBe(1);
	});
});
