import { z } from 'zod';
import { foundationOperations } from './foundation';
import { joineryOperations } from './joinery';
import { shelfOperations } from './shelf';
import type { ApiOperation } from './types';
import { wallOperations } from './wall';
import { workbenchOperations } from './workbench';

export const operations: ApiOperation[] = [
	...foundationOperations,
	...shelfOperations,
	...joineryOperations,
	...wallOperations,
	...workbenchOperations
];

function schemaOf(s: z.ZodType) {
	return z.toJSONSchema(s, { io: 'input', unrepresentable: 'any' });
}

/** The OpenAPI 3.1 document of /api/v1, built from the same zod schemas the routes validate with. */
export function openApiDocument(version: string) {
	const paths: Record<string, Record<string, unknown>> = {};
	for (const op of operations) {
		const item = (paths[op.path] ??= {});
		item[op.method] = {
			summary: op.summary,
			tags: [op.tag],
			security: op.auth === 'none' ? [] : [{ session: [] }, { token: [] }],
			...(op.query ? { parameters: queryParameters(op.query) } : {}),
			...(op.body
				? {
						requestBody: {
							required: true,
							content: { 'application/json': { schema: schemaOf(op.body) } }
						}
					}
				: {}),
			responses: Object.fromEntries(
				Object.entries(op.responses).map(([code, description]) => [
					code,
					{
						description,
						...(Number(code) >= 400
							? {
									content: {
										'application/json': { schema: { $ref: '#/components/schemas/Problem' } }
									}
								}
							: {})
					}
				])
			)
		};
	}
	return {
		openapi: '3.1.0',
		info: { title: 'Spanwright API', version },
		servers: [{ url: '/api/v1' }],
		paths,
		components: {
			securitySchemes: {
				session: { type: 'apiKey', in: 'cookie', name: 'authjs.session-token' },
				token: {
					type: 'http',
					scheme: 'bearer',
					description: 'A personal API token from the account page'
				}
			},
			schemas: {
				Problem: {
					type: 'object',
					required: ['error', 'issues'],
					properties: {
						error: { type: 'string' },
						issues: {
							type: 'array',
							items: {
								type: 'object',
								properties: {
									path: { type: 'array', items: { type: ['string', 'number'] } },
									message: { type: 'string' }
								}
							}
						}
					}
				}
			}
		}
	};
}

function queryParameters(schema: z.ZodType) {
	const js = schemaOf(schema) as { properties?: Record<string, unknown>; required?: string[] };
	return Object.entries(js.properties ?? {}).map(([name, s]) => ({
		name,
		in: 'query',
		required: js.required?.includes(name) ?? false,
		schema: s
	}));
}
