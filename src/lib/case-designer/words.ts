/**
 * Margins in words: what the designer writes beside every shelf, joint and tipping figure, so a
 * result is read without colour and without knowing what a "margin" is.
 */
export interface Verdict {
	pass: boolean;
	/** the shape's stand-in in text: ✓ or ✕ */
	glyph: '✓' | '✕';
	/** "passes, 35% to spare" / "fails, over by 14%" */
	words: string;
}

const percent = (share: number) => `${Math.round(Math.abs(share) * 100)}%`;

/** A margin as a share to spare (0.35) or over (−0.14); null for a failure that is not a number. */
export function marginWords(margin: number | null, pass: boolean): Verdict {
	const glyph = pass ? '✓' : '✕';
	if (margin === null) return { pass, glyph, words: pass ? 'passes' : 'fails' };
	if (pass) {
		const spare = margin >= 1 ? 'nothing to carry' : `${percent(margin)} to spare`;
		return { pass, glyph, words: `passes, ${spare}` };
	}
	if (margin >= 0) return { pass, glyph, words: 'fails' };
	return { pass, glyph, words: `fails, over by ${percent(margin)}` };
}

/** A utilisation (demand over capacity) as words: "uses 31% of what it can carry". */
export function utilisationWords(utilisation: number): string {
	if (!(utilisation > 0)) return 'carries no load here';
	if (utilisation > 9.995) return 'is overloaded more than ten times';
	return `uses ${Math.round(utilisation * 100)}% of what it can carry`;
}

/**
 * The engine names some places in metres ("the shelf at 0.762 m"); write them in the reader's
 * unit instead. `format` is the user's length formatter.
 */
export function inUserUnits(text: string, format: (metres: number) => string): string {
	return text.replace(/(\d+(?:\.\d+)?) m\b/g, (_, n: string) => format(Number(n)));
}

/** How a joint did, in one sentence. */
export function jointSentence(pass: boolean, utilisation: number): string {
	if (!pass) return `Does not carry its load: ${utilisationWords(utilisation)}.`;
	if (!(utilisation > 0)) return 'Nothing to carry as designed; it holds the case together.';
	return `Carries its load: it ${utilisationWords(utilisation)}.`;
}
