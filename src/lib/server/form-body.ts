import { error } from '@sveltejs/kit';

const FORM_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data'];

/**
 * The body of a form action, read once for every action: a body that is not a form (415) or a
 * form that cannot be read, such as multipart without its boundary (400), is answered with a
 * plain message instead of the 500 that `request.formData()` would throw.
 */
export async function readForm(request: Request): Promise<FormData> {
	const type = (request.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase();
	if (!FORM_TYPES.includes(type))
		error(415, 'Send this form as application/x-www-form-urlencoded or multipart/form-data.');
	try {
		return await request.formData();
	} catch {
		error(400, 'The form could not be read. Reload the page and send it again.');
	}
}
