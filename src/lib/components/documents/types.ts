/** A project document as the screens receive it (dates as the load sends them). */
export interface DocumentView {
	id: string;
	name: string;
	caption: string;
	contentType: string;
	bytes: number;
	width: number | null;
	height: number | null;
	inRecord: boolean;
	hasThumbnail: boolean;
	createdAt: Date | string;
	createdByName: string | null;
}

export const fileUrl = (id: string, variant: 'original' | 'thumbnail' = 'original') =>
	`/api/v1/documents/${id}/file${variant === 'thumbnail' ? '?variant=thumbnail' : ''}`;

export function sizeInWords(bytes: number) {
	if (bytes < 1024) return `${bytes} bytes`;
	if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
	return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** What the picker offers; the server decides from the bytes whatever the browser says. */
export const ACCEPTED =
	'image/jpeg,image/png,image/webp,application/pdf,.jpg,.jpeg,.png,.webp,.pdf';
