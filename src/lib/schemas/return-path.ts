// Where to send someone back to after signing in, switching workshop and the like. Every redirect
// target that comes from a request goes through here, so none can lead off the site.

const BASE = 'http://return-path.invalid';
// C0 control characters and DEL: browsers drop tabs and newlines from URLs (`/\t/host` is `//host`
// to them), and a CR or LF in a Location header is refused by the server.
// eslint-disable-next-line no-control-regex -- removing control characters is the point
const CONTROL = /[\u0000-\u001f\u007f]/g;

/**
 * `target` when it is a path on this site, else `fallback`: one leading `/`, no `//` or `/\` once
 * control characters are removed, and the same origin when parsed. The answer is the parsed path
 * (with its query and fragment), so what is redirected to is what was checked.
 */
export function safeRedirectPath(target: string | null | undefined, fallback = '/'): string {
	if (typeof target !== 'string' || target.length > 2000) return fallback;
	const cleaned = target.replace(CONTROL, '');
	if (!cleaned.startsWith('/') || cleaned.startsWith('//') || cleaned.startsWith('/\\'))
		return fallback;
	let url: URL;
	try {
		url = new URL(cleaned, BASE);
	} catch {
		return fallback;
	}
	if (url.origin !== BASE) return fallback;
	return url.pathname + url.search + url.hash;
}
