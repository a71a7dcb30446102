/** What every analysis screen takes: the draft it opens with, the save form, the reader's unit. */
import type { SuperValidated } from 'sveltekit-superforms';
import type { AnalysisSave, SaveMessage } from '$lib/schemas/analysis-form';
import type { UserLengthUnit } from '$lib/workbench/lengths';

export interface ScreenProps<Draft> {
	initial: Draft;
	save: SuperValidated<AnalysisSave, SaveMessage>;
	unit: UserLengthUnit;
	/** the reader may change it (editors, a student their own); otherwise the screen reads only */
	canEdit: boolean;
}
