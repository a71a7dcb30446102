import { renderRecordPdf } from './record-pdf';
import type { RecordDoc } from './records';

/** The record as a PDF download: private to the reader, never cached by anything in between. */
export async function recordPdfResponse(record: RecordDoc) {
	const pdf = await renderRecordPdf(record);
	const base = (record.scope === 'analysis' ? record.items[0]?.name : record.project.name) ?? '';
	const slug = base
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '');
	return new Response(new Uint8Array(pdf), {
		headers: {
			'content-type': 'application/pdf',
			'content-disposition': `attachment; filename="${slug || 'record'}-record.pdf"`,
			'cache-control': 'private, no-store'
		}
	});
}
