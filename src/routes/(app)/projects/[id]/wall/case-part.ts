/** What each part of a case's form takes (its body, frame, shelves, fronts), and its field names. */
import type { CaseDraft } from '$lib/wall-designer/draft';
import type { UserLengthUnit } from '$lib/workbench/lengths';

export interface CasePartProps {
	c: CaseDraft;
	/** the case's place in the wall */
	index: number;
	unit: UserLengthUnit;
	/** messages by field name (`cases.0.shelves.1.height`) */
	errors: Record<string, string>;
}

/** The name of a field of case `index`: `cases.0.shelves.1.height`, as the errors are keyed. */
export const caseField =
	(index: number) =>
	(...keys: (string | number)[]) =>
		['cases', index, ...keys].join('.');
