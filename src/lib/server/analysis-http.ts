/**
 * The API edge of saved analyses: refusals as JSON problems, and the version a write is based on
 * (an `If-Match` ETag or a `version` field) for optimistic concurrency.
 */
import { api, problem } from './http';
import { AnalysisProblem } from './analyses';

/** api() that also answers the data module's 409/422 refusals with their issues. */
export function analysisApi<E>(handler: (event: E) => Promise<Response> | Response) {
	return api(async (event: E) => {
		try {
			return await handler(event);
		} catch (e) {
			if (e instanceof AnalysisProblem) return problem(e.status, e.message, e.issues);
			throw e;
		}
	});
}

/** The ETag of a stored version: `"v3"`. */
export function versionTag(version: number) {
	return `"v${version}"`;
}

/** The version named by If-Match (`"v3"`, `W/"v3"` or `3`), undefined when absent or unreadable. */
function versionFromIfMatch(request: Request): number | undefined {
	const header = request.headers.get('if-match');
	const m = header?.trim().match(/^(?:W\/)?"?v?(\d+)"?$/);
	return m ? Number(m[1]) : undefined;
}

/**
 * The version a write is based on: If-Match or the body's `version`; both given and different is
 * a 422, neither is a 428 (a write must say which version it changes).
 */
export function baseVersion(
	request: Request,
	bodyVersion: number | undefined
): { ok: true; version: number } | { ok: false; response: Response } {
	const header = request.headers.get('if-match');
	const fromHeader = versionFromIfMatch(request);
	if (header && fromHeader === undefined)
		return {
			ok: false,
			response: problem(422, 'If-Match must be the ETag of a version, e.g. "v3".', [
				{ path: ['If-Match'], message: 'Expected an ETag such as "v3".' }
			])
		};
	if (fromHeader !== undefined && bodyVersion !== undefined && fromHeader !== bodyVersion)
		return {
			ok: false,
			response: problem(422, 'If-Match and version name different versions.', [
				{ path: ['version'], message: `If-Match says ${fromHeader}.` }
			])
		};
	const version = fromHeader ?? bodyVersion;
	if (version === undefined)
		return {
			ok: false,
			response: problem(
				428,
				'Say which version you are changing: send If-Match with its ETag, or a version field.',
				[{ path: ['version'], message: 'Expected the version you last read.' }]
			)
		};
	return { ok: true, version };
}
