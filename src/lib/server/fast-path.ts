import type { IncomingMessage, ServerResponse } from 'node:http';
import { dev } from '$app/environment';
import { COMPUTE_ENDPOINTS, computeAnswer, type ComputeEndpoint } from './compute-api';
import { reportError } from './errors';
import { HSTS, SECURITY_HEADERS } from './hooks/security-headers';
import { JSON_TYPE, MAX_BODY_BYTES, parseJsonText } from './http';
import { limitCompute } from './rate-limit';

/**
 * The fast path of the open compute API. The production server (server.js) offers every request to
 * it before SvelteKit's handler; it takes only the common case: a POST of a JSON body with a
 * Content-Length to one of the compute paths exactly (no query but a lone `curve` parameter on the
 * shelf endpoints, no trailing slash), from an address
 * found as adapter-node finds it. It answers those as the app would, with the same code: the
 * same per-address rate limit (rate-limit.ts, counted before the body is read), the same shared
 * schema and engine call (compute-api.ts), the same problems and status codes (413, 400, 422, 429,
 * 500), and the same headers (security headers, Retry-After, Connection: close when the body was
 * left unread). Everything else (another method or path, a query, a form or another body type, a
 * missing length, a body over BODY_SIZE_LIMIT) it leaves to SvelteKit, which answers it in full.
 * tests/server/fast-path.test.ts proves the answers the same as the routes'.
 */
export type FastPath = (req: IncomingMessage, res: ServerResponse) => boolean;

/** Where server.js finds the fast path once the build's handler has started the app. */
export const FAST_PATH_KEY = Symbol.for('spanwright.fast-path');

/** adapter-node's reading of BODY_SIZE_LIMIT (512K by default; K, M, G suffixes). */
export function parseBodySizeLimit(value = '512K'): number {
	const multiplier =
		{ K: 1024, M: 1024 * 1024, G: 1024 * 1024 * 1024 }[value.at(-1)?.toUpperCase() ?? ''] ?? 1;
	return Number(multiplier !== 1 ? value.slice(0, -1) : value) * multiplier;
}

interface Settings {
	bodySizeLimit: number;
	addressHeader: string;
	xffDepth: number;
}

let settings: Settings | undefined;

function read(): Settings {
	settings ??= {
		bodySizeLimit: parseBodySizeLimit(process.env.BODY_SIZE_LIMIT),
		addressHeader: (process.env.ADDRESS_HEADER ?? '').toLowerCase(),
		xffDepth: parseInt(process.env.XFF_DEPTH ?? '1')
	};
	return settings;
}

/** For tests: read the environment again. */
export function resetFastPathSettings() {
	settings = undefined;
}

/** The client's address as adapter-node gives it to the app; undefined where it would fail. */
export function clientAddress(req: IncomingMessage, s = read()): string | undefined {
	if (s.addressHeader) {
		const value = req.headers[s.addressHeader];
		if (value === undefined || Array.isArray(value)) return undefined;
		if (s.addressHeader !== 'x-forwarded-for') return value;
		const addresses = value.split(',');
		if (!(s.xffDepth >= 1) || s.xffDepth > addresses.length) return undefined;
		return addresses[addresses.length - s.xffDepth].trim();
	}
	return req.socket?.remoteAddress;
}

let securityHeaders: Readonly<Record<string, string>> | undefined;

/** The security headers every answer carries, written out once; each answer adds to a copy. */
const baseHeaders = (): Record<string, string> => {
	if (!securityHeaders) {
		const headers: Record<string, string> = {};
		for (const [name, value] of Object.entries(SECURITY_HEADERS))
			headers[name.toLowerCase()] = value;
		if (!dev) headers['strict-transport-security'] = HSTS;
		securityHeaders = Object.freeze(headers);
	}
	return { ...securityHeaders };
};

/** A JSON answer, as SvelteKit's json() and the security-headers hook would write it. */
function sendJson(res: ServerResponse, status: number, body: unknown, unread = false) {
	// encoded once: its length and what is sent
	const bytes = Buffer.from(JSON.stringify(body));
	const headers = baseHeaders();
	headers['content-length'] = String(bytes.length);
	headers['content-type'] = 'application/json';
	if (unread) headers['connection'] = 'close';
	res.writeHead(status, headers);
	res.end(bytes);
}

/** A Response from the app's own code (the rate limiter's 429), with the same added headers. */
async function sendResponse(res: ServerResponse, response: Response, unread: boolean) {
	const headers = baseHeaders();
	response.headers.forEach((value, name) => (headers[name] = value));
	if (unread) headers['connection'] = 'close';
	const text = await response.text();
	res.writeHead(response.status, headers);
	res.end(text);
}

/** The body as Request.text() reads it: UTF-8, a leading byte-order mark dropped. */
function readBody(req: IncomingMessage): Promise<string> {
	return new Promise((resolve, reject) => {
		const chunks: Buffer[] = [];
		req.on('data', (chunk: Buffer) => chunks.push(chunk));
		req.on('end', () => resolve(new TextDecoder().decode(Buffer.concat(chunks))));
		req.on('error', reject);
	});
}

async function answer(
	req: IncomingMessage,
	res: ServerResponse,
	endpoint: ComputeEndpoint,
	address: string,
	length: number,
	query: string | undefined
) {
	try {
		const limited = await limitCompute(address);
		if (limited) return await sendResponse(res, limited, true);
		if (length > MAX_BODY_BYTES)
			return sendJson(res, 413, { error: 'The request body is too large.', issues: [] }, true);
		let text: string;
		try {
			text = await readBody(req);
		} catch {
			return sendJson(res, 400, { error: 'The request body is not valid JSON.', issues: [] });
		}
		const read = parseJsonText(text, req.headers['content-type'], endpoint.schema);
		if (!read.ok) return sendJson(res, read.status, { error: read.error, issues: read.issues });
		const result = computeAnswer(
			endpoint,
			read.data,
			query === undefined ? undefined : new URLSearchParams(query)
		);
		sendJson(res, result.status, result.body);
	} catch (error) {
		const body = reportError({
			error,
			status: 500,
			message: 'Internal Error',
			method: 'POST',
			path: req.url ?? ''
		});
		if (res.headersSent) res.destroy();
		else sendJson(res, 500, body, !req.readableEnded);
	}
}

/** Answer the request here and return true, or return false and leave it to SvelteKit. */
export const fastPath: FastPath = (req, res) => {
	if (req.method !== 'POST' || !req.url) return false;
	// the path exactly, with no query but a lone `curve` parameter on the endpoints that read it
	const mark = req.url.indexOf('?');
	const endpoint = COMPUTE_ENDPOINTS.get(mark < 0 ? req.url : req.url.slice(0, mark));
	if (!endpoint) return false;
	const query = mark < 0 ? undefined : req.url.slice(mark + 1);
	if (query !== undefined && !(endpoint.curve && LONE_CURVE.test(query))) return false;
	const type = req.headers['content-type'];
	if (!type || !JSON_TYPE.test(type)) return false;
	const declared = req.headers['content-length'];
	const length = Number(declared);
	const s = read();
	if (!declared || !(length > 0) || length > s.bodySizeLimit) return false;
	const address = clientAddress(req, s);
	if (!address) return false;
	void answer(req, res, endpoint, address, length, query);
	return true;
};

/** A query of one `curve` parameter and nothing else (its value is read as the route reads it). */
const LONE_CURVE = /^curve=[^&#]*$/;

/** Make the fast path available to server.js (called from the app's init hook). */
export function registerFastPath() {
	(globalThis as Record<symbol, unknown>)[FAST_PATH_KEY] = fastPath;
}
