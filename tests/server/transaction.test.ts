// The transaction helper on the one SQLite connection: all or nothing, and a statement from outside
// an open transaction waits for it to end instead of landing inside it (and being undone with it).
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { getDb, transaction } from '../../src/lib/server/db';
import { signInFailures } from '../../src/lib/server/db/schema';
import { useTempDb } from './support/db';

useTempDb();

const keys = async (key: string) =>
	(await getDb().select().from(signInFailures).where(eq(signInFailures.key, key))).length;
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('transaction()', () => {
	it('keeps all of the work, or none of it when the work throws', async () => {
		await transaction(async (tx) => {
			await tx.insert(signInFailures).values({ key: 'kept', at: new Date() });
			await tx.insert(signInFailures).values({ key: 'kept', at: new Date() });
		});
		expect(await keys('kept')).toBe(2);
		await expect(
			transaction(async (tx) => {
				await tx.insert(signInFailures).values({ key: 'undone', at: new Date() });
				throw new Error('stop');
			})
		).rejects.toThrow('stop');
		expect(await keys('undone')).toBe(0);
	});

	it('makes a write from outside wait, so undoing the transaction never undoes it', async () => {
		const order: string[] = [];
		const inside = transaction(async (tx) => {
			await tx.insert(signInFailures).values({ key: 'inside', at: new Date() });
			order.push('inside wrote');
			await pause(30); // another request's turn comes while the transaction is open
			order.push('inside ends');
			throw new Error('undo');
		});
		const outside = (async () => {
			await pause(5);
			await getDb().insert(signInFailures).values({ key: 'outside', at: new Date() });
			order.push('outside wrote');
		})();
		await expect(inside).rejects.toThrow('undo');
		await outside;
		expect(order).toEqual(['inside wrote', 'inside ends', 'outside wrote']);
		expect(await keys('inside')).toBe(0);
		expect(await keys('outside')).toBe(1);
	});

	it('runs transactions one after another, and one begun inside another is part of it', async () => {
		const order: string[] = [];
		await Promise.all(
			[1, 2, 3].map((n) =>
				transaction(async () => {
					order.push(`begin ${n}`);
					await pause(5);
					// getDb() inside is the transaction's handle; a nested transaction joins it
					await transaction(() =>
						getDb().insert(signInFailures).values({ key: 'serial', at: new Date() })
					);
					order.push(`end ${n}`);
				})
			)
		);
		expect(order).toEqual(['begin 1', 'end 1', 'begin 2', 'end 2', 'begin 3', 'end 3']);
		expect(await keys('serial')).toBe(3);
	});
});
