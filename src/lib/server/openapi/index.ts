import { z } from 'zod';
import { createDocument, type oas31, type ZodOpenApiOperationObject } from 'zod-openapi';
import { problemSchema } from '$lib/schemas/responses/common';
import { classSessionOperations } from './class-sessions';
import { documentOperations } from './documents';
import { foundationOperations } from './foundation';
import { joineryOperations } from './joinery';
import { shelfOperations } from './shelf';
import type { ApiOperation, ApiResponse } from './types';
import { wallOperations } from './wall';
import { workbenchOperations } from './workbench';

export const operations: ApiOperation[] = [
	...foundationOperations,
	...shelfOperations,
	...joineryOperations,
	...wallOperations,
	...workbenchOperations,
	...documentOperations,
	...classSessionOperations
];

/** The session cookie Auth.js sets over HTTPS (plain http in development drops the prefix). */
const SESSION_COOKIE = '__Secure-authjs.session-token';

/** Refusals every operation of a sort can give, added so no operation forgets them. */
function commonRefusals(op: ApiOperation): Record<number, string> {
	const out: Record<number, string> = {};
	if (op.auth !== 'none') out[401] = 'Not signed in (no session, or a bad or revoked token)';
	if (op.body) {
		out[400] = 'The body is not JSON';
		out[413] = 'The body is too large';
		out[415] = 'The body is not sent as application/json';
		out[422] ??= 'Some fields need attention; each issue names its path and what was expected';
	}
	if (op.query) out[422] = 'Some query parameters need attention';
	if (op.rateLimited)
		out[429] = 'Too many requests from this address; wait for Retry-After seconds';
	if (Object.keys(op.responses).every((s) => Number(s) < 400) && !Object.keys(out).length)
		out[404] = 'Not found';
	return out;
}

function pathParams(op: ApiOperation) {
	const names = [...op.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
	if (!names.length) return undefined;
	const given = op.params?.shape ?? {};
	return z.object(Object.fromEntries(names.map((n) => [n, given[n] ?? z.string()])));
}

function responseObject(status: number, r: ApiResponse | string) {
	const res: ApiResponse = typeof r === 'string' ? { description: r } : r;
	const schema = status >= 400 ? problemSchema : res.schema;
	return {
		description: res.description,
		...(res.headers
			? {
					headers: Object.fromEntries(
						Object.entries(res.headers).map(([h, description]) => [
							h,
							{ description, schema: { type: 'string' as const } }
						])
					)
				}
			: {}),
		...(status === 429
			? {
					headers: {
						'Retry-After': {
							description: 'Seconds to wait',
							schema: { type: 'integer' as const }
						}
					}
				}
			: {}),
		...(schema ? { content: { 'application/json': { schema } } } : {})
	};
}

function operationObject(op: ApiOperation): ZodOpenApiOperationObject {
	const path = pathParams(op);
	const responses = { ...commonRefusals(op), ...op.responses };
	return {
		operationId: op.operationId,
		summary: op.summary,
		tags: [op.tag],
		security: op.auth === 'none' ? [] : [{ session: [] }, { token: [] }],
		...(path || op.query
			? { requestParams: { ...(path ? { path } : {}), ...(op.query ? { query: op.query } : {}) } }
			: {}),
		...(op.body
			? {
					requestBody: {
						required: true,
						content: { 'application/json': { schema: op.body } }
					}
				}
			: {}),
		responses: Object.fromEntries(
			Object.entries(responses)
				.sort(([a], [b]) => Number(a) - Number(b))
				.map(([code, r]) => [code, responseObject(Number(code), r)])
		)
	};
}

let cached: { version: string; doc: oas31.OpenAPIObject } | undefined;

/** The OpenAPI 3.1 document of /api/v1, generated (once) from the zod schemas the routes use. */
export function openApiDocument(version: string): oas31.OpenAPIObject {
	if (cached?.version !== version) cached = { version, doc: generate(version) };
	return cached.doc;
}

function generate(version: string): oas31.OpenAPIObject {
	const paths: Record<string, Record<string, ZodOpenApiOperationObject>> = {};
	for (const op of operations) (paths[op.path] ??= {})[op.method] = operationObject(op);
	return createDocument({
		openapi: '3.1.0',
		info: {
			title: 'Spanwright API',
			version,
			description:
				'Shelf sag, joints, tip-over and whole-case checks (estimates, in SI units), and the ' +
				'workshops, projects and saved analyses of a signed-in user.',
			license: { name: 'Proprietary', identifier: 'LicenseRef-Proprietary' }
		},
		servers: [{ url: '/api/v1' }],
		paths,
		components: {
			securitySchemes: {
				session: {
					type: 'apiKey',
					in: 'cookie',
					name: SESSION_COOKIE,
					description:
						'The browser session set by signing in (over plain http in development the cookie is authjs.session-token)'
				},
				token: {
					type: 'http',
					scheme: 'bearer',
					description: 'A personal API token from the account page'
				}
			}
		}
	});
}
