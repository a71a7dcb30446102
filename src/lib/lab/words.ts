/**
 * The lab's shelf in one sentence: what is drawn and how far it sags, for the readout under the
 * drawing and for screen readers.
 */
import { aboutWritten } from '../kinds/shelf-words';
import { SUPPORTS, shortName, whenText, type LabRun, type LabState } from './lab-state';

export function describeLab(
	s: LabState,
	run: LabRun,
	format: (m: number) => string,
	loadText: string
): string {
	const held = SUPPORTS.find((o) => o.id === s.support)?.label.toLowerCase() ?? '';
	const load =
		s.loadKind === 'books'
			? `books at ${loadText}`
			: `one ${loadText} weight ${format(s.pointAt * s.spanM)} from the left end`;
	const nosing = s.nosingM > 0 ? `, with a ${format(s.nosingM)} nosing` : '';
	return (
		`A ${format(s.spanM)} ${shortName(s.material)} shelf, ${format(s.thicknessM)} thick and ` +
		`${format(s.depthM)} deep${nosing}, ${held}, carrying ${load}, sags ${aboutWritten(run.sagM, format(run.sagM))} ` +
		`${whenText(s.days)}${s.days > 0 ? ` (${format(run.result.sag.instant)} when loaded)` : ''}. An estimate.`
	);
}
