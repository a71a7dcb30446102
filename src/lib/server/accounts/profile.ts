import { error } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import type { LengthUnit } from '../../schemas/preferences';
import { LENGTH_UNITS } from '../../schemas/preferences';
import type { Actor } from '../access';
import { getDb, firstRow } from '../db';
import { users } from '../db/tables';

export async function getProfile(actor: Actor) {
	const row = await getDb()
		.select({ id: users.id, email: users.email, name: users.name, lengthUnit: users.lengthUnit })
		.from(users)
		.where(eq(users.id, actor.id))
		.then(firstRow);
	if (!row) error(401, 'Sign in to continue.');
	return { ...row, lengthUnit: asLengthUnit(row.lengthUnit) };
}

function asLengthUnit(value: string): LengthUnit {
	return (LENGTH_UNITS as readonly string[]).includes(value) ? (value as LengthUnit) : 'frac16';
}

export async function setLengthUnit(actor: Actor, unit: LengthUnit) {
	if (!(LENGTH_UNITS as readonly string[]).includes(unit))
		throw new Error(`unknown length unit ${unit}`);
	await getDb().update(users).set({ lengthUnit: unit }).where(eq(users.id, actor.id));
	// the rest of this request (the page's load after the action) writes in the new unit
	actor.lengthUnit = unit;
}

export async function updateProfile(actor: Actor, input: { name: string; lengthUnit: LengthUnit }) {
	await setLengthUnit(actor, input.lengthUnit);
	await getDb().update(users).set({ name: input.name.trim() }).where(eq(users.id, actor.id));
}
