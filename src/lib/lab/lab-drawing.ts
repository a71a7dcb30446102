// What the lab's drawing is given: the shelf's shape, its support, its sag and its load with the
// load's words (books along it, or one weight where it stands).
import type { LabDrawingInput } from '$lib/components/lab-shelf';
import type { LabModel } from './lab-model.svelte';
import { sliders } from './lab-state';

type Drawn = Pick<LabModel, 'shelf' | 'shape' | 'run'>;

/** the load in words: books per length, or the one weight */
export function loadLabel(lab: Pick<LabModel, 'shelf'>, specs: ReturnType<typeof sliders>): string {
	return lab.shelf.loadKind === 'books'
		? specs.booksNPerM.text(lab.shelf.booksNPerM)
		: specs.pointN.text(lab.shelf.pointN);
}

export function labDrawing(lab: Drawn, label: string): LabDrawingInput {
	const { shelf } = lab;
	return {
		...lab.shape,
		support: shelf.support,
		sagM: lab.run.sagM,
		load:
			shelf.loadKind === 'books'
				? { kind: 'books', label: `books, ${label}` }
				: { kind: 'point', atM: shelf.pointAt * shelf.spanM, label }
	};
}
