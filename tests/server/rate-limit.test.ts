// The open compute routes are limited per client address: 429 with Retry-After once the budget is
// used, counted in the database on PostgreSQL so several instances share it (in the one server's
// memory on SQLite).
import { describe, expect, it } from 'vitest';
import { computeLimit } from '../../src/lib/server/hooks/compute-limit';
import { COMPUTE_BUDGET, COMPUTE_REQUESTS, limiterFor } from '../../src/lib/server/rate-limit';
import { dialect, getDb } from '../../src/lib/server/db';
import { eq } from 'drizzle-orm';
import { rateLimits } from '../../src/lib/server/db/tables';
import { useTempDb } from './support/db';

useTempDb();

function call(path: string, address: string, method = 'POST') {
	const url = new URL(path, 'http://localhost:5173');
	return computeLimit({
		event: {
			url,
			request: new Request(url, { method }),
			getClientAddress: () => address
		},
		resolve: () => new Response('{}', { headers: { 'content-type': 'application/json' } })
	} as never);
}

describe('the compute rate limit', () => {
	it('answers 429 with Retry-After once an address has used its budget, for every compute route', async () => {
		const routes = [
			'/api/v1/shelf',
			'/api/v1/shelf/max-span',
			'/api/v1/joints',
			'/api/v1/stability',
			'/api/v1/cases/check'
		];
		for (let i = 0; i < COMPUTE_REQUESTS; i++) {
			const res = await call(routes[i % routes.length], '203.0.113.20');
			expect(res.status).toBe(200);
		}
		for (const route of routes) {
			const res = await call(route, '203.0.113.20');
			expect(res.status).toBe(429);
			const wait = Number(res.headers.get('retry-after'));
			expect(wait).toBeGreaterThanOrEqual(1);
			expect(wait).toBeLessThanOrEqual(60);
			const body = await res.json();
			expect(body.error).toMatch(/Too many calculations/);
			expect(body.issues).toEqual([]);
		}
		// another address is not affected
		expect((await call('/api/v1/shelf', '198.51.100.20')).status).toBe(200);
	});

	it('keeps its counts in the database on PostgreSQL, in the one server on SQLite', async () => {
		await call('/api/v1/joints', '192.0.2.77');
		const [row] = await getDb()
			.select({ points: rateLimits.points })
			.from(rateLimits)
			.where(eq(rateLimits.key, 'compute:192.0.2.77'));
		// several app servers share a PostgreSQL database, so they share its counts; a SQLite file
		// has one server, which counts in its memory without a write per request
		if (dialect === 'pg') expect(row?.points).toBe(1);
		else expect(row).toBeUndefined();
		expect((await limiterFor(COMPUTE_BUDGET).get('192.0.2.77'))?.consumedPoints).toBe(1);
	});

	it('leaves other routes and methods alone', async () => {
		for (let i = 0; i < COMPUTE_REQUESTS + 5; i++)
			expect((await call('/api/v1/projects', '192.0.2.88')).status).toBe(200);
		expect((await call('/api/v1/materials', '192.0.2.88', 'GET')).status).toBe(200);
	});
});
