// The production server (`npm start`): SvelteKit's built handler (adapter-node) behind the fast path
// of the open compute API (src/lib/server/fast-path.ts), its pages compressed (gzip or brotli, as
// the browser accepts) past 1 kB; the built files are served already compressed. Importing the handler starts the app (its
// init hook registers the fast path); each request is offered to the fast path first, and whatever it
// leaves goes to SvelteKit. The handler reads the same environment as `node build` (ORIGIN,
// BODY_SIZE_LIMIT, ADDRESS_HEADER, XFF_DEPTH, PROTOCOL_HEADER, HOST_HEADER); this file reads PORT,
// HOST, SOCKET_PATH, KEEP_ALIVE_TIMEOUT, HEADERS_TIMEOUT and SHUTDOWN_TIMEOUT as `node build` does.
import compression from 'compression';
import http from 'node:http';
import process from 'node:process';
import { handler } from './build/handler.js';

const fastPath = globalThis[Symbol.for('spanwright.fast-path')];
if (typeof fastPath !== 'function')
	throw new Error('The app did not register its fast path (src/hooks.server.ts, init).');

const socketPath = process.env.SOCKET_PATH;
const host = process.env.HOST ?? '0.0.0.0';
const port = Number(process.env.PORT ?? 3000);
const shutdownTimeout = Number(process.env.SHUTDOWN_TIMEOUT ?? 30);

// pages only: the API answers as the fast path does, uncompressed, whichever way a request came
const compress = compression({
	filter: (req, res) => /^text\/html\b/.test(String(res.getHeader('content-type') ?? ''))
});
const notFound = (req, res) => {
	res.statusCode = 404;
	res.end('Not found');
};
const server = http.createServer((req, res) => {
	if (fastPath(req, res)) return;
	compress(req, res, () => handler(req, res, () => notFound(req, res)));
});
if (process.env.KEEP_ALIVE_TIMEOUT)
	server.keepAliveTimeout = Number(process.env.KEEP_ALIVE_TIMEOUT) * 1000;
if (process.env.HEADERS_TIMEOUT) server.headersTimeout = Number(process.env.HEADERS_TIMEOUT) * 1000;

if (socketPath) server.listen(socketPath, () => console.log(`Listening on ${socketPath}`));
else server.listen(port, host, () => console.log(`Listening on http://${host}:${port}`));

// As `node build` does: stop taking requests, let those under way finish, then close what is left.
let stopping = false;
function shutdown(reason) {
	if (stopping) return;
	stopping = true;
	server.closeIdleConnections();
	server.close(() => process.emit('sveltekit:shutdown', reason));
	setTimeout(() => server.closeAllConnections(), shutdownTimeout * 1000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
