import { describe, expect, it } from 'vitest';
import { clearPending, keepPending, readPending } from '../../../src/lib/lab/pending-shelf';

class MemoryStore implements Storage {
	private m = new Map<string, string>();
	get length() {
		return this.m.size;
	}
	clear() {
		this.m.clear();
	}
	getItem(k: string) {
		return this.m.get(k) ?? null;
	}
	key(i: number) {
		return [...this.m.keys()][i] ?? null;
	}
	removeItem(k: string) {
		this.m.delete(k);
	}
	setItem(k: string, v: string) {
		this.m.set(k, v);
	}
}

describe('a shelf check kept before signing up', () => {
	it('keeps the request and its name until it is saved', () => {
		const store = new MemoryStore();
		const input = { span: '30 1/2"', depth: '11"', thickness: '3/4"', material: 'mdf' };
		keepPending(input, 'My first shelf check', store);
		const read = readPending(store);
		expect(read?.name).toBe('My first shelf check');
		expect(read?.input).toEqual(input);
		clearPending(store);
		expect(readPending(store)).toBeNull();
	});

	it('ignores what is unreadable or older than a week', () => {
		const store = new MemoryStore();
		store.setItem('spanwright:pending-shelf', '{not json');
		expect(readPending(store)).toBeNull();
		keepPending({ span: 1 }, 'old', store);
		expect(readPending(store, Date.now() + 8 * 24 * 3600 * 1000)).toBeNull();
		store.setItem('spanwright:pending-shelf', JSON.stringify({ name: 3, input: {}, at: 1 }));
		expect(readPending(store)).toBeNull();
	});
});
