import { eq } from 'drizzle-orm';
import type { Actor } from '../access';
import { getDb, firstRow, isUniqueViolation, oneRow, transaction } from '../db';
import { users } from '../db/tables';
import { readLengthUnit } from '../preferences';
import { createWorkshopFor } from '../workshops';
import { hashPassword } from './passwords';

export interface AccountUser {
	id: string;
	email: string;
	name: string | null;
}

export class AccountExistsError extends Error {
	constructor() {
		super('An account with this e-mail address already exists.');
	}
}

/** Create an account with a password, and the personal workshop every account starts with. */
export async function createUser(input: {
	name: string;
	email: string;
	password: string;
}): Promise<AccountUser> {
	const email = input.email.trim().toLowerCase();
	const passwordHash = await hashPassword(input.password);
	try {
		return await transaction(async (tx) => {
			const user = await tx
				.insert(users)
				.values({ name: input.name.trim(), email, passwordHash })
				.returning({ id: users.id, email: users.email, name: users.name })
				.then(oneRow);
			await createWorkshopFor(user.id, `${input.name.trim()}’s workshop`, true);
			return { id: user.id, email: user.email ?? email, name: user.name };
		});
	} catch (e) {
		if (isUniqueViolation(e)) throw new AccountExistsError();
		throw e;
	}
}

export async function findUserByEmail(email: string) {
	return await getDb()
		.select()
		.from(users)
		.where(eq(users.email, email.trim().toLowerCase()))
		.then(firstRow);
}

/** The acting user for a user id (from a verified session), or null when the account is gone. */
export async function actorForUserId(
	id: string,
	via: Actor['via'] = 'session'
): Promise<Actor | null> {
	const user = await getDb()
		.select({ id: users.id, email: users.email, name: users.name, lengthUnit: users.lengthUnit })
		.from(users)
		.where(eq(users.id, id))
		.then(firstRow);
	if (!user?.email) return null;
	return {
		id: user.id,
		email: user.email,
		name: user.name,
		via,
		lengthUnit: readLengthUnit(user.lengthUnit)
	};
}
