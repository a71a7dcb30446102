import { describe, expect, it } from 'vitest';
import {
	TEXT,
	VIEW,
	centredX,
	textLayout,
	textScale
} from '../../../src/lib/components/lab-shelf/geometry';

// The lab's drawing on a phone: its words grow in the drawing's own units so they stay readable
// on screen, and the drawing makes room for them instead of letting them run off its edges.

describe('words in the lab drawing', () => {
	it('keep the notes 13 px tall on screen when the drawing is narrow, and never shrink it', () => {
		// a 343 px drawing (a 375 px phone less the card's padding): 13 × 1000 / (15 × 343)
		const k = textScale(343);
		expect(k).toBeCloseTo((13 * 1000) / (15 * 343), 12);
		expect(TEXT.note * k * (343 / VIEW.width)).toBeCloseTo(13, 9);
		// a desktop drawing wider than 867 px keeps the drawing's own sizes
		expect(textScale(1150)).toBe(1);
		// a projector asks for 22 px notes
		expect(textScale(1150, 22)).toBeCloseTo((22 * 1000) / (15 * 1150), 12);
		// before the width is measured (server rendering)
		expect(textScale(0)).toBe(1);
	});

	it('leaves the desktop drawing as it was and makes room above and below on a phone', () => {
		const flat = textLayout(1, false);
		expect(flat.viewBox).toBe(`0 0 ${VIEW.width} ${VIEW.height}`);
		expect(flat.noteY).toBeCloseTo(21.75, 9);
		expect(flat.sagY).toBeCloseTo(346.2, 9);

		const phone = textLayout(2.5, true);
		const [, top, , height] = phone.viewBox.split(' ').map(Number);
		expect(top).toBe(-54);
		// the note's letters (about one size tall above its baseline) stay inside the top
		expect(phone.noteY - TEXT.note * 2.5).toBeGreaterThanOrEqual(top);
		// the clip note sits under the sag line, and both inside the bottom
		expect(phone.clipY).toBeGreaterThan(phone.sagY + TEXT.note * 2.5);
		expect(top + height).toBeGreaterThan(phone.clipY);
	});

	it('moves a centred line in from an edge it would run past', () => {
		// 21 characters at 45 units: about 586 units wide
		expect(centredX(280, 21, 45)).toBeCloseTo(4 + (21 * 0.62 * 45) / 2, 9);
		expect(centredX(990, 21, 45)).toBeCloseTo(VIEW.width - 4 - (21 * 0.62 * 45) / 2, 9);
		expect(centredX(500, 21, 18)).toBe(500);
		// wider than the drawing: centred on it
		expect(centredX(100, 200, 45)).toBe(VIEW.width / 2);
	});
});
