import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ContentMap } from '../../src/lib/engine/memo';

// The case check's caches (engine/memo.ts) find an entry by the content of a request, as a
// JSON.stringify key did, without writing numbers out as text.
describe('ContentMap', () => {
	it('finds a key exactly when JSON.stringify writes it the same as the one stored', () => {
		fc.assert(
			fc.property(fc.jsonValue(), fc.jsonValue(), (a, b) => {
				const map = new ContentMap<string>().set(a, 'a');
				const same = JSON.stringify(a) === JSON.stringify(b);
				expect(map.get(b)).toBe(same ? 'a' : undefined);
				// a copy made through JSON is always found
				expect(map.get(JSON.parse(JSON.stringify(a)))).toBe('a');
			})
		);
	});
	it('tells apart what differs only in structure or in a name', () => {
		const keys = [
			{ a: 'b' },
			{ b: 'a' },
			['a', 'b'],
			[['a'], 'b'],
			['a', ['b']],
			{ a: ['b'] },
			{ a: { b: 1 } },
			{ a: 1, b: 1 },
			{ a: 1 },
			'a',
			1,
			'1',
			true,
			'true',
			null,
			'null',
			[],
			{}
		];
		const map = new ContentMap<number>();
		keys.forEach((k, i) => map.set(k, i));
		keys.forEach((k, i) => expect(map.get(k)).toBe(i));
	});
	it('skips undefined properties as JSON does and reads an undefined array element as null', () => {
		const map = new ContentMap<string>().set({ a: 1, b: undefined }, 'x').set([undefined], 'y');
		expect(map.get({ a: 1 })).toBe('x');
		expect(map.get([null])).toBe('y');
		// properties in another order are another key, as they are to JSON.stringify
		expect(map.get({ b: undefined, a: 1, c: undefined })).toBe('x');
		expect(new ContentMap().set({ a: 1, b: 2 }, 1).get({ b: 2, a: 1 })).toBeUndefined();
	});
});
