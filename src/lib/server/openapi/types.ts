import type { z } from 'zod';

/** A documented answer: its description, and the schema of its JSON body (none for 204). */
export interface ApiResponse {
	description: string;
	schema?: z.ZodType;
	/** response headers worth naming (ETag, Retry-After), each with a description */
	headers?: Record<string, string>;
}

/**
 * One operation of the public API, described once and turned into the OpenAPI document
 * (see DEVELOPERS.md, "Adding an API operation").
 */
export interface ApiOperation {
	/** unique, camelCase: what a generated client calls the method */
	operationId: string;
	method: 'get' | 'post' | 'put' | 'patch' | 'delete';
	/** OpenAPI path, e.g. `/projects/{id}` (relative to /api/v1) */
	path: string;
	summary: string;
	tag: string;
	/** the path parameters; every `{name}` in the path not named here is documented as a string */
	params?: z.ZodObject;
	/** the shared zod schema of the query string, if any */
	query?: z.ZodObject;
	/** the shared zod schema of the JSON body, if any */
	body?: z.ZodType;
	/** 'none' for routes anyone may call; 'user' (the default) needs a session or a token */
	auth?: 'none' | 'user';
	/** open compute routes limited per client address (answer 429 with Retry-After) */
	rateLimited?: boolean;
	/** success answers with their body schema; refusals (≥ 400) with a description only */
	responses: Record<number, ApiResponse | string>;
}
