/** One file on its way to the project, as the uploader shows it. */
export interface Sending {
	key: number;
	file: File;
	caption: string;
	state: 'ready' | 'sending' | 'done' | 'failed' | 'cancelled';
	progress: number;
	message: string;
	abort?: () => void;
}

/**
 * Send one file through the API with progress (fetch cannot report upload progress, so this uses
 * XMLHttpRequest). Resolves when it is done, refused, failed or cancelled; never rejects.
 */
export function sendFile(projectId: string, item: Sending): Promise<void> {
	return new Promise((done) => {
		const xhr = new XMLHttpRequest();
		const body = new FormData();
		body.append('file', item.file);
		body.append('caption', item.caption);
		item.state = 'sending';
		item.progress = 0;
		item.message = '';
		item.abort = () => xhr.abort();
		xhr.upload.onprogress = (e) => {
			if (e.lengthComputable) item.progress = Math.round((100 * e.loaded) / e.total);
		};
		xhr.onload = () => {
			if (xhr.status === 201) {
				item.state = 'done';
				item.progress = 100;
				item.message = 'Added.';
			} else {
				item.state = 'failed';
				item.message = problemMessage(xhr.responseText, xhr.status);
			}
			done();
		};
		xhr.onerror = () => {
			item.state = 'failed';
			item.message = 'The connection dropped before the file arrived; try again.';
			done();
		};
		xhr.onabort = () => {
			item.state = 'cancelled';
			item.message = 'Cancelled; nothing was added.';
			done();
		};
		xhr.open('POST', `/api/v1/projects/${projectId}/documents`);
		xhr.send(body);
	});
}

function problemMessage(text: string, status: number) {
	try {
		const body = JSON.parse(text) as { error?: string };
		if (body.error) return body.error;
	} catch {
		// not a JSON problem (a proxy's page, say)
	}
	return status === 413 ? 'The file is too large.' : `The file was not added (${status}).`;
}
