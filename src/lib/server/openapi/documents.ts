import { documentPatchSchema } from '$lib/schemas/document';
import {
	documentDeletedSchema,
	documentListSchema,
	documentSchema
} from '$lib/schemas/responses/documents';
import type { ApiOperation } from './types';

const reader = { 404: 'No such document or project, or not yours to see' };
const editor = { ...reader, 403: 'Needs the editor role' };

// ---- project documents: drawings, site photos, measurements ----
// The stored file itself, GET /documents/{id}/file (`?variant=thumbnail`, `?download`), is not a
// JSON operation and is described in the README.
export const documentOperations: ApiOperation[] = [
	{
		operationId: 'listDocuments',
		method: 'get',
		path: '/projects/{id}/documents',
		tag: 'documents',
		summary: "The project's documents, newest first",
		responses: { 200: { description: 'Documents', schema: documentListSchema }, ...reader }
	},
	{
		operationId: 'addDocument',
		method: 'post',
		path: '/projects/{id}/documents',
		tag: 'documents',
		summary:
			'Add a file, sent as multipart/form-data: `file`, optional `caption` and `analysisId`. JPEG, PNG and WebP images (metadata removed, turned upright) and PDF drawings, decided from the bytes',
		responses: {
			201: { description: 'Added', schema: documentSchema },
			400: 'Unreadable upload',
			413: 'Over the per-file or per-project limit',
			415: 'Not multipart, or not an image or PDF (SVG and other scriptable files are refused)',
			422: 'Invalid fields or a damaged image',
			...editor
		}
	},
	{
		operationId: 'getDocument',
		method: 'get',
		path: '/documents/{id}',
		tag: 'documents',
		summary: 'One document',
		responses: { 200: { description: 'The document', schema: documentSchema }, ...reader }
	},
	{
		operationId: 'updateDocument',
		method: 'patch',
		path: '/documents/{id}',
		tag: 'documents',
		summary:
			"Change the caption, the analysis it is about, or whether the client's record shows it",
		body: documentPatchSchema,
		responses: {
			200: { description: 'Changed', schema: documentSchema },
			422: 'Invalid fields',
			...editor
		}
	},
	{
		operationId: 'deleteDocument',
		method: 'delete',
		path: '/documents/{id}',
		tag: 'documents',
		summary: 'Delete; undo within 10 minutes, after which the files are removed',
		responses: {
			200: {
				description: 'Deleted, and until when it can be undone',
				schema: documentDeletedSchema
			},
			...editor
		}
	},
	{
		operationId: 'undeleteDocument',
		method: 'post',
		path: '/documents/{id}/undelete',
		tag: 'documents',
		summary: 'Undo a delete within its window',
		responses: {
			200: { description: 'Back', schema: documentSchema },
			409: 'Deleted too long ago',
			...editor
		}
	}
];
