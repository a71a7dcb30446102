/**
 * The laws of a sagging shelf in words and numbers, each found by running the engine twice: once
 * as the shelf is and once with one thing changed. Nothing here is a remembered ratio: the words
 * follow whatever the engine answers (16 for a span doubled under books, 8 under one weight).
 */
import { formatNumber } from '../engine/index';
import { bendingSag, runLab, shortName, type LabState } from './lab-state';

export type LawVariable = 'span' | 'thickness' | 'depth' | 'material' | 'support' | 'time';

export interface Law {
	variable: LawVariable;
	/** the law in words, e.g. "Twice the span → 16 times the sag" */
	text: string;
	/** the same change for this very shelf, with its own weight and shear */
	detail: string;
	/** the ratio behind the words (bending alone), new sag over old */
	ratio: number;
}

const FRACTIONS = [
	'',
	'',
	'half',
	'a third',
	'a quarter',
	'a fifth',
	'a sixth',
	'a seventh',
	'an eighth',
	'a ninth',
	'a tenth'
];

/** "16 times the sag", "an eighth of the sag", "the same sag", "1/27 of the sag". */
export function ratioWords(ratio: number): string {
	if (!Number.isFinite(ratio) || ratio <= 0) return 'no sag to compare';
	if (Math.abs(ratio - 1) < 0.005) return 'the same sag';
	if (ratio > 1) {
		const r = Number(ratio.toPrecision(2));
		return Math.abs(r - 2) < 0.005 ? 'twice the sag' : `${formatNumber(r, 2)} times the sag`;
	}
	const inverse = 1 / ratio;
	const whole = Math.round(inverse);
	if (Math.abs(inverse - whole) < 0.02 * inverse && whole < FRACTIONS.length && whole >= 2)
		return whole === 2 ? 'half the sag' : `${FRACTIONS[whole]} of the sag`;
	return `1/${formatNumber(inverse, 2)} of the sag`;
}

function pair(ratioBending: number, ratioReal: number, head: string): Omit<Law, 'variable'> {
	return {
		text: `${head} → ${ratioWords(ratioBending)}`,
		detail: `This shelf, with its own weight and shear: ${ratioWords(ratioReal)}.`,
		ratio: ratioBending
	};
}

/** The material a material is compared with: the one before it, else MDF (or red oak for MDF). */
export function comparedMaterial(current: string, previous: string | null): string {
	if (previous && previous !== current) return previous;
	return current === 'mdf' ? 'red-oak' : 'mdf';
}

export function lawsFor(s: LabState, previousMaterial: string | null = null): Law[] {
	const real = runLab(s).sagM;
	const bent = bendingSag(s);
	const ratios = (change: Partial<LabState>) => {
		const t = { ...s, ...change };
		return [bendingSag(t) / bent, runLab(t).sagM / real] as const;
	};
	const laws: Law[] = [];
	const [spanB, spanR] = ratios({ spanM: s.spanM * 2 });
	laws.push({ variable: 'span', ...pair(spanB, spanR, 'Twice the span') });
	const [thickB, thickR] = ratios({ thicknessM: s.thicknessM * 2 });
	laws.push({ variable: 'thickness', ...pair(thickB, thickR, 'Twice the thickness') });
	const [depthB, depthR] = ratios({ depthM: s.depthM * 2 });
	laws.push({ variable: 'depth', ...pair(depthB, depthR, 'Twice the depth, same load') });

	// stiffness is the instant sag's business; creep is the time law's
	const other = comparedMaterial(s.material, previousMaterial);
	const instant = { ...s, days: 0 };
	const matB = bendingSag({ ...instant, material: other }) / bendingSag(instant);
	const matYear =
		runLab({ ...s, days: 365, material: other }).sagM / runLab({ ...s, days: 365 }).sagM;
	const stiffer = matB >= 1;
	const times = stiffer ? matB : 1 / matB;
	laws.push({
		variable: 'material',
		text: `${shortName(s.material)} is about ${formatNumber(times, 2)} times ${stiffer ? 'stiffer than' : 'as flexible as'} ${shortName(other)}`,
		detail: `After a year under the same load, the shelf in ${shortName(other)} would have ${ratioWords(matYear)} (creep differs too).`,
		ratio: matB
	});

	if (s.support !== 'pins') {
		const [supB, supR] = ratios({ support: 'pins' });
		laws.push({
			variable: 'support',
			...pair(1 / supB, 1 / supR, 'This support instead of pins at both ends')
		});
	}
	const now = runLab({ ...s, days: 0 });
	const year = runLab({ ...s, days: 365 });
	const creep = now.sagM > 0 ? year.sagM / now.sagM : NaN;
	laws.push({
		variable: 'time',
		text: `A year under load → ${ratioWords(creep)} it had when loaded`,
		detail: `Creep of ${shortName(s.material)} in a dry room (the engine's creep factor ${formatNumber(year.result.sag.creepFactor, 2)}).`,
		ratio: creep
	});
	return laws;
}
