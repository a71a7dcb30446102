import { json } from '@sveltejs/kit';
import { sql } from 'drizzle-orm';
import { getDb } from '$lib/server/db';
import { version } from '../../../../../package.json';

export const GET = () => {
	getDb().get(sql`select 1`);
	return json({ status: 'ok', version });
};
