import { json } from '@sveltejs/kit';
import { ping } from '$lib/server/db';
import { version } from '../../../../../package.json';

export const GET = async () => {
	await ping();
	return json({ status: 'ok', version });
};
