// The transaction helper: all or nothing, on both engines. On the one SQLite connection a statement
// from outside an open transaction waits for it to end instead of landing inside it (and being
// undone with it); on PostgreSQL it runs on another pooled connection meanwhile and is kept, and
// the open transaction's writes stay unseen until it commits.
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { dialect, getDb, transaction } from '../../src/lib/server/db';
import { signInFailures } from '../../src/lib/server/db/tables';
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

	it('never undoes a write from outside when the transaction is undone', async () => {
		const order: string[] = [];
		let seenFromOutside = -1;
		let outsideDone = () => {};
		const outsideWrote = new Promise<void>((r) => (outsideDone = r));
		const inside = transaction(async (tx) => {
			await tx.insert(signInFailures).values({ key: 'inside', at: new Date() });
			order.push('inside wrote');
			// another request's turn comes while the transaction is open (on PostgreSQL it ends
			// meanwhile; on SQLite it cannot, it waits)
			await (dialect === 'pg' ? Promise.race([outsideWrote, pause(5000)]) : pause(30));
			order.push('inside ends');
			throw new Error('undo');
		});
		const outside = (async () => {
			await pause(5);
			seenFromOutside = await keys('inside');
			await getDb().insert(signInFailures).values({ key: 'outside', at: new Date() });
			order.push('outside wrote');
			outsideDone();
		})();
		await expect(inside).rejects.toThrow('undo');
		await outside;
		if (dialect === 'sqlite') {
			// the outside statements waited for the transaction to end
			expect(order).toEqual(['inside wrote', 'inside ends', 'outside wrote']);
			expect(seenFromOutside).toBe(0);
		} else {
			// another connection went on meanwhile, and did not see the uncommitted row
			expect(order).toEqual(['inside wrote', 'outside wrote', 'inside ends']);
			expect(seenFromOutside).toBe(0);
		}
		expect(await keys('inside')).toBe(0);
		expect(await keys('outside')).toBe(1);
	});

	it('runs transactions one after another on SQLite, and one begun inside another is part of it', async () => {
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
		// on SQLite one at a time; on PostgreSQL side by side, each on its own connection
		if (dialect === 'sqlite')
			expect(order).toEqual(['begin 1', 'end 1', 'begin 2', 'end 2', 'begin 3', 'end 3']);
		else
			expect([...order].sort()).toEqual([
				'begin 1',
				'begin 2',
				'begin 3',
				'end 1',
				'end 2',
				'end 3'
			]);
		expect(await keys('serial')).toBe(3);
	});

	it("undoes a nested transaction's work with the outer one", async () => {
		await expect(
			transaction(async () => {
				await transaction(() =>
					getDb().insert(signInFailures).values({ key: 'nested', at: new Date() })
				);
				throw new Error('undo all');
			})
		).rejects.toThrow('undo all');
		expect(await keys('nested')).toBe(0);
	});
});
