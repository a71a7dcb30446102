import { eq } from 'drizzle-orm';
import type { Actor } from './access';
import { getDb } from './db';
import { users } from './db/schema';
import { LENGTH_UNITS, type LengthUnit } from '$lib/schemas/preferences';

/** The actor's chosen way of writing lengths (fractional inches to a precision, decimal inches, mm). */
export function lengthUnitOf(actor: Actor): LengthUnit {
	const row = getDb()
		.select({ u: users.lengthUnit })
		.from(users)
		.where(eq(users.id, actor.id))
		.get();
	return (LENGTH_UNITS as readonly string[]).includes(row?.u ?? '')
		? (row!.u as LengthUnit)
		: 'frac16';
}
