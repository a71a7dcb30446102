// The bench's yardstick: a bare node:http JSON server with no framework, no limits and no checks.
// It reads the request body, parses it as JSON and answers with a stored answer (the one the app
// gave for the same request, passed in ANSWER_FILE) serialised again for every request, so both
// servers put the same bytes on the wire. Started by tests/bench/api/api.ts.
import { readFileSync } from 'node:fs';
import http from 'node:http';

const answer = JSON.parse(readFileSync(process.env.ANSWER_FILE, 'utf8'));
const server = http.createServer((req, res) => {
	let body = '';
	req.setEncoding('utf8');
	req.on('data', (chunk) => (body += chunk));
	req.on('end', () => {
		try {
			JSON.parse(body || '{}');
		} catch {
			res.writeHead(400, { 'content-type': 'application/json' });
			return res.end('{"error":"bad JSON"}');
		}
		const text = JSON.stringify(answer);
		res.writeHead(200, {
			'content-type': 'application/json',
			'content-length': Buffer.byteLength(text)
		});
		res.end(text);
	});
});
server.listen(Number(process.env.PORT), '127.0.0.1', () => console.log('bare server listening'));
