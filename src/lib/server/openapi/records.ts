import type { ApiOperation } from './types';

const readers = {
	401: 'Not signed in',
	404: 'No such project or analysis, or the actor may not read it'
};

// ---- the record a client reads, as a PDF (members of the workshop and the project's clients) ----
export const recordOperations: ApiOperation[] = [
	{
		method: 'get',
		path: '/projects/{id}/record.pdf',
		tag: 'records',
		summary: "The project's record as a PDF (application/pdf): every saved analysis in plain words",
		responses: { 200: 'The PDF', ...readers }
	},
	{
		method: 'get',
		path: '/analyses/{id}/record.pdf',
		tag: 'records',
		summary: "One analysis's record as a PDF (application/pdf)",
		responses: { 200: 'The PDF', ...readers }
	}
];
