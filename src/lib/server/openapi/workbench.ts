import {
	analysisDeletedSchema,
	analysisPageSchema,
	analysisSchema,
	analysisWithRoleSchema,
	revisionListSchema,
	revisionSchema
} from '$lib/schemas/responses/analyses';
import {
	analysisCreateSchema,
	analysisDuplicateSchema,
	analysisListQuerySchema,
	analysisMoveSchema,
	analysisPatchSchema,
	analysisPutSchema,
	analysisRestoreSchema
} from '$lib/schemas/analysis';
import type { ApiOperation } from './types';

const signedIn = { 401: 'Not signed in' };
const member = { ...signedIn, 404: 'No such project or analysis, or not a member' };
const editor = { ...member, 403: 'Editors only' };
const etag = { ETag: 'The version, e.g. "v3": send it back in If-Match to change this version' };
const versioned = {
	409: 'Stale version: the analysis changed since it was read; nothing was written',
	422: 'Invalid fields (the input is checked by the engine schema of its kind)',
	428: 'No If-Match header and no version field'
};

// ---- saved analyses of a project: list, create, read, update, delete, revisions ----
export const workbenchOperations: ApiOperation[] = [
	{
		operationId: 'listAnalyses',
		method: 'get',
		path: '/projects/{id}/analyses',
		tag: 'analyses',
		summary: "A page of a project's analyses, searched, filtered by kind and verdict, sorted",
		query: analysisListQuerySchema,
		responses: {
			200: { description: '{ items, total, page, perPage }', schema: analysisPageSchema },
			422: 'Invalid query',
			...member
		}
	},
	{
		operationId: 'createAnalysis',
		method: 'post',
		path: '/projects/{id}/analyses',
		tag: 'analyses',
		summary: 'Save an analysis (editor); the server computes its result with the engine',
		body: analysisCreateSchema,
		responses: {
			201: { description: 'Created, with its ETag', schema: analysisSchema, headers: etag },
			422: 'Invalid fields',
			...editor
		}
	},
	{
		operationId: 'getAnalysis',
		method: 'get',
		path: '/analyses/{id}',
		tag: 'analyses',
		summary: 'An analysis with its input, result, summary and version (ETag)',
		responses: { 200: { description: 'Analysis', schema: analysisWithRoleSchema }, ...member }
	},
	{
		operationId: 'updateAnalysis',
		method: 'patch',
		path: '/analyses/{id}',
		tag: 'analyses',
		summary: 'Rename and/or change the input (editor), with If-Match or version',
		body: analysisPatchSchema,
		responses: {
			200: { description: 'Changed, recomputed, new ETag', schema: analysisSchema, headers: etag },
			...versioned,
			...editor
		}
	},
	{
		operationId: 'replaceAnalysis',
		method: 'put',
		path: '/analyses/{id}',
		tag: 'analyses',
		summary: 'Replace the name and input (editor), with If-Match or version',
		body: analysisPutSchema,
		responses: {
			200: { description: 'Replaced, recomputed, new ETag', schema: analysisSchema, headers: etag },
			...versioned,
			...editor
		}
	},
	{
		operationId: 'deleteAnalysis',
		method: 'delete',
		path: '/analyses/{id}',
		tag: 'analyses',
		summary: 'Delete an analysis (editor); it can be brought back until undoUntil',
		responses: {
			200: {
				description: '{ id, projectId, deletedAt, undoUntil }',
				schema: analysisDeletedSchema
			},
			...editor
		}
	},
	{
		operationId: 'undeleteAnalysis',
		method: 'post',
		path: '/analyses/{id}/undelete',
		tag: 'analyses',
		summary: 'Undo a delete within its window (editor)',
		responses: {
			200: { description: 'Restored analysis', schema: analysisSchema },
			409: 'Deleted too long ago',
			...editor
		}
	},
	{
		operationId: 'listRevisions',
		method: 'get',
		path: '/analyses/{id}/revisions',
		tag: 'analyses',
		summary: 'Every version of an analysis, newest first, with who saved it and its summary',
		responses: { 200: { description: '{ items }', schema: revisionListSchema }, ...member }
	},
	{
		operationId: 'getRevision',
		method: 'get',
		path: '/analyses/{id}/revisions/{version}',
		tag: 'analyses',
		summary: 'One version: its name, input, result and summary',
		responses: { 200: { description: 'Revision', schema: revisionSchema }, ...member }
	},
	{
		operationId: 'restoreRevision',
		method: 'post',
		path: '/analyses/{id}/revisions/{version}',
		tag: 'analyses',
		summary: 'Restore a version as a new version, recomputed now (editor)',
		body: analysisRestoreSchema,
		responses: {
			200: { description: 'Restored, new ETag', schema: analysisSchema, headers: etag },
			409: 'Stale version',
			422: 'Invalid fields',
			...editor
		}
	},
	{
		operationId: 'duplicateAnalysis',
		method: 'post',
		path: '/analyses/{id}/duplicate',
		tag: 'analyses',
		summary: 'Copy an analysis within its project (editor), recomputed now',
		body: analysisDuplicateSchema,
		responses: {
			201: { description: 'The copy', schema: analysisSchema },
			422: 'Invalid fields',
			...editor
		}
	},
	{
		operationId: 'moveAnalysis',
		method: 'post',
		path: '/analyses/{id}/move',
		tag: 'analyses',
		summary: 'Move an analysis to another project of the same workshop (editor)',
		body: analysisMoveSchema,
		responses: {
			200: { description: 'Moved', schema: analysisSchema },
			422: 'Target is in another workshop',
			...editor
		}
	}
];
