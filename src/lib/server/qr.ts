import QRCode from 'qrcode';

/**
 * A QR code as one SVG path (a unit square per dark module) and its size in modules, so a page
 * draws it with its own markup. Error correction M: still reads with a corner washed out by a
 * projector's glare.
 */
export function qrPath(text: string): { size: number; d: string } {
	const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
	const parts: string[] = [];
	for (let y = 0; y < modules.size; y++)
		for (let x = 0; x < modules.size; x++) if (modules.get(x, y)) parts.push(`M${x} ${y}h1v1h-1z`);
	return { size: modules.size, d: parts.join('') };
}
