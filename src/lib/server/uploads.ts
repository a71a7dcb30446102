import { documentFieldsSchema, type DocumentFields } from '$lib/schemas/document';
import { problem, zodIssues } from './http';

export type Upload = { file: { bytes: Uint8Array; name: string }; fields: DocumentFields };

/**
 * Read one uploaded file and its fields from a multipart body. A problem Response for anything
 * else: 415 for another content type, 400 for a body that cannot be read, 422 for missing or
 * invalid fields. The file's type is decided later from its bytes, never here.
 */
export async function readUpload(
	request: Request
): Promise<{ ok: true; upload: Upload } | { ok: false; response: Response }> {
	const type = request.headers.get('content-type') ?? '';
	if (!type.toLowerCase().startsWith('multipart/form-data'))
		return { ok: false, response: problem(415, 'Send the file as multipart/form-data.') };
	let form: FormData;
	try {
		form = await request.formData();
	} catch {
		return { ok: false, response: problem(400, 'The upload could not be read.') };
	}
	const file = form.get('file');
	if (!(file instanceof File))
		return {
			ok: false,
			response: problem(422, 'Choose a file to add.', [{ path: ['file'], message: 'Required.' }])
		};
	const fields = documentFieldsSchema.safeParse({
		caption: form.get('caption') ?? undefined,
		analysisId: form.get('analysisId') ?? undefined
	});
	if (!fields.success)
		return {
			ok: false,
			response: problem(422, 'Some fields need attention.', zodIssues(fields.error))
		};
	return {
		ok: true,
		upload: {
			file: { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name },
			fields: fields.data
		}
	};
}

/** The headers a stored file is served with: never sniffed, never run, named as uploaded. */
export function fileHeaders(file: { contentType: string; name: string }, download: boolean) {
	// a PDF is always a download: the browser's viewer would run it in our origin
	const disposition = download || file.contentType === 'application/pdf' ? 'attachment' : 'inline';
	const ascii = file.name.replace(/[^\x20-\x7e]|["\\]/g, '_');
	return {
		'content-type': file.contentType,
		'content-disposition': `${disposition}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.name)}`,
		'x-content-type-options': 'nosniff',
		'content-security-policy':
			"default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
		'cache-control': 'private, max-age=300'
	};
}
