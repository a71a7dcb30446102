import type { z } from 'zod';

/** One operation of the public API, described once and turned into the OpenAPI document. */
export interface ApiOperation {
	method: 'get' | 'post' | 'put' | 'patch' | 'delete';
	/** OpenAPI path, e.g. `/projects/{id}` (relative to /api/v1) */
	path: string;
	summary: string;
	tag: string;
	/** the shared zod schema of the JSON body, if any */
	body?: z.ZodType;
	/** the shared zod schema of the query string, if any */
	query?: z.ZodType;
	/** 'none' for routes anyone may call */
	auth?: 'none' | 'user';
	responses: Record<number, string>;
}
