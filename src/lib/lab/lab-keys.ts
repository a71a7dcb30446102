// The lab's keyboard: arrows nudge the chosen variable and space steps the experiment, unless a
// field or a slider uses them (a button or a link does not use arrows, and keeps space for itself).
import type { LabModel } from './lab-model.svelte';

type Keyed = Pick<LabModel, 'nudge' | 'step' | 'experiment'>;

const ARROWS: Record<string, 1 | -1> = { ArrowRight: 1, ArrowUp: 1, ArrowLeft: -1, ArrowDown: -1 };

export function labKeydown(lab: Keyed) {
	return (event: KeyboardEvent) => {
		const t = event.target as HTMLElement;
		if (event.altKey || event.ctrlKey || event.metaKey) return;
		if (t.closest('input, select, textarea, [role="slider"], [contenteditable]')) return;
		if (event.key === ' ' && t.closest('button, a')) return;
		const dir = ARROWS[event.key];
		if (dir) {
			event.preventDefault();
			lab.nudge(dir);
		} else if (event.key === ' ' && lab.experiment) {
			event.preventDefault();
			lab.step(event.shiftKey ? -1 : 1);
		}
	};
}
