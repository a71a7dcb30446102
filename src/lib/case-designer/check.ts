/**
 * The case check as the designer runs it on every change: the shared schema reads the design, the
 * engine checks it, and every problem comes back as an issue keyed by the form field it belongs to
 * (never a thrown error in the middle of typing).
 */
import { caseDesignSchema, type CaseDesign, type CaseDesignInput } from '../schemas/case';
import { cleanPath, fieldIssues } from '../schemas/issues';
import { checkCaseSI } from '../engine/case/check';
import type { CaseResult } from '../engine/case/types';
import { InputError } from '../engine/errors';

export interface FieldIssue {
	/** the form field: `width`, `shelves.2.thickness`, `shelves.2.load` */
	field: string;
	message: string;
}

export type CaseRun =
	{ ok: true; design: CaseDesign; result: CaseResult } | { ok: false; issues: FieldIssue[] };

type Path = readonly PropertyKey[];

/** The form field an issue's path belongs to: a shelf's loads are one field, its spread load. */
export function fieldKey(path: Path): string {
	const parts = cleanPath(path);
	const at = parts.indexOf('loads');
	if (at >= 0) return [...parts.slice(0, at), 'load'].join('.');
	return parts.join('.') || 'form';
}

export function runCase(input: CaseDesignInput): CaseRun {
	const read = caseDesignSchema.safeParse(input);
	if (!read.success)
		return {
			ok: false,
			issues: fieldIssues(read.error).map((i) => ({ field: fieldKey(i.path), message: i.message }))
		};
	try {
		return { ok: true, design: read.data, result: checkCaseSI(read.data) };
	} catch (e) {
		if (e instanceof InputError)
			return {
				ok: false,
				issues: e.issues.map((i) => ({ field: fieldKey(i.path), message: i.message }))
			};
		throw e;
	}
}

/** The first message for each field. */
export function issuesByField(issues: FieldIssue[]): Record<string, string> {
	const out: Record<string, string> = {};
	for (const i of issues) out[i.field] ??= i.message;
	return out;
}
