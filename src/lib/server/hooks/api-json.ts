import type { Handle } from '@sveltejs/kit';
import { problem } from '../http';

const MESSAGES: Record<number, string> = {
	404: 'There is no such API path. The operations are listed in /api/v1/openapi.json.',
	405: 'This path does not answer that method.'
};

/**
 * Every answer under /api/ is JSON: an unknown path or a wrong method (which SvelteKit answers as an
 * HTML page or plain text) becomes a `{ error, issues }` problem with the same status and headers.
 */
export const apiJson: Handle = async ({ event, resolve }) => {
	if (!event.url.pathname.startsWith('/api/')) return resolve(event);
	const response = await resolve(event);
	const type = response.headers.get('content-type') ?? '';
	if (response.status < 400 || /[/+]json\b/i.test(type)) return response;
	const text = MESSAGES[response.status] ? '' : (await response.text()).trim();
	const message =
		MESSAGES[response.status] ??
		(text && text.length < 300 && !text.startsWith('<') ? text : 'The request was refused.');
	const json = problem(response.status, message);
	for (const [name, value] of response.headers)
		if (!/^content-(type|length)$/i.test(name)) json.headers.set(name, value);
	return json;
};
