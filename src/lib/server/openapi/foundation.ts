import {
	apiTokenCreatedSchema,
	apiTokenListSchema,
	healthSchema,
	meSchema,
	projectPageSchema,
	projectSchema,
	projectWithRoleSchema,
	workshopDetailSchema,
	workshopListSchema,
	workshopSchema,
	workshopWithRoleSchema
} from '$lib/schemas/responses/foundation';
import {
	projectCreateSchema,
	projectListQuerySchema,
	projectPatchSchema
} from '$lib/schemas/project';
import { workshopNameSchema, workshopPatchSchema } from '$lib/schemas/workshop';
import { apiTokenCreateSchema } from '$lib/schemas/account';
import type { ApiOperation } from './types';

const signedIn = { 401: 'Not signed in' };
const member = { ...signedIn, 404: 'No such workshop or project, or not a member' };

// ---- health, workshops, projects ----
const workshopAndProjectOperations: ApiOperation[] = [
	{
		operationId: 'getHealth',
		method: 'get',
		path: '/health',
		tag: 'service',
		summary: 'Whether the service and its database answer',
		auth: 'none',
		responses: { 200: { description: 'Healthy', schema: healthSchema } }
	},
	{
		operationId: 'listWorkshops',
		method: 'get',
		path: '/workshops',
		tag: 'workshops',
		summary: "The actor's workshops with their role in each",
		responses: { 200: { description: 'Workshops', schema: workshopListSchema }, ...signedIn }
	},
	{
		operationId: 'createWorkshop',
		method: 'post',
		path: '/workshops',
		tag: 'workshops',
		summary: 'Create a workshop owned by the actor',
		body: workshopNameSchema,
		responses: {
			201: { description: 'Created', schema: workshopWithRoleSchema },
			422: 'Invalid fields',
			...signedIn
		}
	},
	{
		operationId: 'getWorkshop',
		method: 'get',
		path: '/workshops/{id}',
		tag: 'workshops',
		summary: 'A workshop and its members',
		responses: { 200: { description: 'Workshop', schema: workshopDetailSchema }, ...member }
	},
	{
		operationId: 'renameWorkshop',
		method: 'patch',
		path: '/workshops/{id}',
		tag: 'workshops',
		summary: 'Rename a workshop, or make it a class whose members may be students (owner)',
		body: workshopPatchSchema,
		responses: {
			200: { description: 'Changed', schema: workshopSchema },
			403: 'Owners only',
			409: 'A personal workshop cannot be a class; a class with students stays one',
			422: 'Invalid fields',
			...member
		}
	},
	{
		operationId: 'deleteWorkshop',
		method: 'delete',
		path: '/workshops/{id}',
		tag: 'workshops',
		summary: 'Delete a workshop and everything in it (owner)',
		responses: {
			204: 'Deleted',
			403: 'Owners only',
			409: 'A personal workshop cannot be deleted',
			...member
		}
	},
	{
		operationId: 'listProjects',
		method: 'get',
		path: '/projects',
		tag: 'projects',
		summary: "A page of a workshop's projects, searched and sorted",
		query: projectListQuerySchema,
		responses: {
			200: { description: '{ items, total, page, perPage }', schema: projectPageSchema },
			422: 'Invalid query',
			...member
		}
	},
	{
		operationId: 'createProject',
		method: 'post',
		path: '/projects',
		tag: 'projects',
		summary: 'Create a project (editor)',
		body: projectCreateSchema,
		responses: {
			201: { description: 'Created', schema: projectSchema },
			403: 'Editors only',
			422: 'Invalid fields',
			...member
		}
	},
	{
		operationId: 'getProject',
		method: 'get',
		path: '/projects/{id}',
		tag: 'projects',
		summary: 'A project, with the actor’s role',
		responses: { 200: { description: 'Project', schema: projectWithRoleSchema }, ...member }
	},
	{
		operationId: 'updateProject',
		method: 'patch',
		path: '/projects/{id}',
		tag: 'projects',
		summary: 'Change a project’s name, client or site notes (editor)',
		body: projectPatchSchema,
		responses: {
			200: { description: 'Changed', schema: projectSchema },
			403: 'Editors only',
			422: 'Invalid fields',
			...member
		}
	},
	{
		operationId: 'deleteProject',
		method: 'delete',
		path: '/projects/{id}',
		tag: 'projects',
		summary: 'Delete a project and its analyses (editor)',
		responses: { 204: 'Deleted', 403: 'Editors only', ...member }
	}
];

// ---- accounts (me, tokens): appended by the accounts work ----
const accountOperations: ApiOperation[] = [
	{
		operationId: 'getMe',
		method: 'get',
		path: '/me',
		tag: 'accounts',
		summary: 'The caller: id, e-mail, name, how they signed in, length unit and workshops',
		responses: { 200: { description: 'The caller', schema: meSchema }, ...signedIn }
	},
	{
		operationId: 'listApiTokens',
		method: 'get',
		path: '/tokens',
		tag: 'accounts',
		summary: "The caller's live API tokens (name, prefix, dates; never the secret)",
		responses: { 200: { description: 'Tokens', schema: apiTokenListSchema }, ...signedIn }
	},
	{
		operationId: 'createApiToken',
		method: 'post',
		path: '/tokens',
		tag: 'accounts',
		summary: 'Create an API token; the secret is in this answer only. Needs a session, not a token',
		body: apiTokenCreateSchema,
		responses: {
			201: { description: 'Created, with the secret', schema: apiTokenCreatedSchema },
			403: 'Called with a token',
			422: 'Invalid fields',
			...signedIn
		}
	},
	{
		operationId: 'revokeApiToken',
		method: 'delete',
		path: '/tokens/{id}',
		tag: 'accounts',
		summary: "Revoke one of the caller's tokens",
		responses: { 204: 'Revoked', 404: 'No such live token of the caller', ...signedIn }
	}
];

export const foundationOperations: ApiOperation[] = [
	...workshopAndProjectOperations,
	...accountOperations
];
