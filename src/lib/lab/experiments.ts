/**
 * Ready-made demonstrations for a class: each a few states of the lab's shelf. A step may ask the
 * class to predict what the next step does to the sag; the answer is not stored here but found by
 * running the engine on both states and picking the choice nearest the real ratio.
 */
import { METRES_PER_INCH } from '../engine/index';
import { NOSING, START, runLab, type LabState } from './lab-state';
import { ratioWords } from './laws';

export interface Choice {
	id: string;
	label: string;
	/** the new sag over the old that this choice stands for */
	ratio: number;
}

export interface ExperimentStep {
	/** what the screen says at this step */
	say: string;
	/** what changes from the step before (the first step starts from the lab's own shelf) */
	set: Partial<LabState>;
	/** a prediction about the next step */
	ask?: { question: string; choices: Choice[] };
}

export interface Experiment {
	id: string;
	title: string;
	steps: ExperimentStep[];
}

const IN = METRES_PER_INCH;
const growth = (...r: number[]): Choice[] =>
	r.map((ratio) => ({
		id: `x${ratio}`,
		label: ratio === 1 ? 'About the same' : `About ${ratio} times as much`,
		ratio
	}));
const shrink = (...r: number[]): Choice[] =>
	r.map((d) => ({
		id: `d${d}`,
		label: d === 1 ? 'About the same' : `About 1/${d} as much`,
		ratio: 1 / d
	}));

const base: Partial<LabState> = { ...START, days: 0 };

export const EXPERIMENTS: Experiment[] = [
	{
		id: 'span',
		title: 'Span: what length does',
		steps: [
			{
				say: 'A 24" red oak shelf on pins, loaded with books.',
				set: { ...base, spanM: 24 * IN },
				ask: {
					question: 'We double the span to 48". What happens to the sag?',
					choices: growth(2, 4, 8, 16)
				}
			},
			{ say: 'The same shelf, 48" long, with books along all of it.', set: { spanM: 48 * IN } },
			{
				say: 'Now one 50 lb weight in the middle of a 24" span instead of the books.',
				set: { spanM: 24 * IN, loadKind: 'point', pointN: START.pointN, pointAt: 0.5 },
				ask: {
					question: 'We double the span again, with the same one weight. The sag?',
					choices: growth(2, 4, 8, 16)
				}
			},
			{ say: 'One weight in the middle of a 48" span.', set: { spanM: 48 * IN } }
		]
	},
	{
		id: 'thickness',
		title: 'Thickness: what depth of board does',
		steps: [
			{
				say: 'A 36" shelf of 3/4" red oak on pins.',
				set: { ...base },
				ask: {
					question: 'We glue up a shelf twice as thick, 1 1/2". The sag?',
					choices: shrink(2, 4, 8, 16)
				}
			},
			{
				say: 'The same shelf, 1 1/2" thick (and twice as heavy itself).',
				set: { thicknessM: 1.5 * IN }
			}
		]
	},
	{
		id: 'material',
		title: 'Material: stiffness',
		steps: [
			{
				say: 'A 36" shelf of 3/4" MDF on pins, books on it.',
				set: { ...base, material: 'mdf' },
				ask: { question: 'The same shelf in solid red oak. The sag?', choices: shrink(1, 2, 5, 10) }
			},
			{ say: 'Red oak, same size and load.', set: { material: 'red-oak' } }
		]
	},
	{
		id: 'nosing',
		title: 'Nosing: a strip on the front edge',
		steps: [
			{
				say: 'A 36" red oak shelf, 3/4" thick, on pins.',
				set: { ...base, nosingM: 0 },
				ask: {
					question: 'We glue a 1 1/2" tall oak strip along the front edge. The sag?',
					choices: shrink(1, 2, 3, 6)
				}
			},
			{ say: 'With the nosing glued on.', set: { nosingM: NOSING.heightM } }
		]
	},
	{
		id: 'creep',
		title: 'Creep: time under load',
		steps: [
			{
				say: 'A 36" MDF shelf the moment the books go on.',
				set: { ...base, material: 'mdf' },
				ask: {
					question: 'The books stay there a year. The sag then?',
					choices: growth(1, 1.5, 2, 3)
				}
			},
			{ say: 'The same MDF shelf after a year under the books.', set: { days: 365 } }
		]
	},
	{
		id: 'supports',
		title: 'Supports: how the ends are held',
		steps: [
			{
				say: 'A 36" red oak shelf resting on pins.',
				set: { ...base },
				ask: {
					question: 'Both ends fixed firmly in dadoes instead. The sag?',
					choices: shrink(1, 2, 5, 10)
				}
			},
			{
				say: 'Both ends fixed.',
				set: { support: 'fixed' },
				ask: {
					question: 'Back on pins, but with a divider under the middle. Compared with fixed ends?',
					choices: shrink(1, 2, 4, 8)
				}
			},
			{ say: 'On pins over a divider in the middle.', set: { support: 'divider' } }
		]
	}
];

/** The shelf at step `i`: every step's changes up to it, over the lab's starting shelf. */
export function stateAt(e: Experiment, i: number): LabState {
	let s: LabState = { ...START };
	for (let k = 0; k <= i && k < e.steps.length; k++) s = { ...s, ...e.steps[k].set };
	return s;
}

export interface Answer {
	/** new sag over old, as the engine finds it */
	ratio: number;
	choice: Choice;
	words: string;
}

/** The answer to step `i`'s question, from the engine: step i+1's sag over step i's. */
export function answerTo(e: Experiment, i: number): Answer | null {
	const ask = e.steps[i]?.ask;
	if (!ask || i + 1 >= e.steps.length) return null;
	const ratio = runLab(stateAt(e, i + 1)).sagM / runLab(stateAt(e, i)).sagM;
	const off = (c: Choice) => Math.abs(Math.log(ratio / c.ratio));
	const choice = ask.choices.reduce((a, b) => (off(b) < off(a) ? b : a));
	return { ratio, choice, words: ratioWords(ratio) };
}
