import { eq } from 'drizzle-orm';
import type { Actor } from './access';
import { getDb, firstRow } from './db';
import { users } from './db/tables';
import { LENGTH_UNITS, type LengthUnit } from '$lib/schemas/preferences';

/** The actor's chosen way of writing lengths (fractional inches to a precision, decimal inches, mm). */
export async function lengthUnitOf(actor: Actor): Promise<LengthUnit> {
	if (actor.lengthUnit) return actor.lengthUnit;
	const row = await getDb()
		.select({ u: users.lengthUnit })
		.from(users)
		.where(eq(users.id, actor.id))
		.then(firstRow);
	return readLengthUnit(row?.u);
}

/** A stored length unit, or the default (1/16") for a missing or unknown one. */
export function readLengthUnit(stored: string | null | undefined): LengthUnit {
	return (LENGTH_UNITS as readonly string[]).includes(stored ?? '')
		? (stored as LengthUnit)
		: 'frac16';
}
