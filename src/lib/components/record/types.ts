/** The record as the page receives it (src/lib/server/records.ts builds it). */
import type { LengthUnit } from '../../schemas/preferences';

export interface RecordItemView {
	id: string;
	kind: string;
	kindLabel: string;
	name: string;
	version: number;
	engineVersion: string;
	updatedAt: Date | string;
	pass: boolean | null;
	verdict: string;
	inputs: [string, string][];
	steps: string[];
	cautions: string[];
	/** note numbers of this item's sources */
	notes: number[];
	/** stored SI input and result, for the measured drawing */
	input: unknown;
	result: unknown;
}

export interface RecordView {
	shop: string;
	project: { id: string; name: string; client: string };
	scope: 'project' | 'analysis';
	date: Date | string;
	unit: LengthUnit;
	items: RecordItemView[];
	cautions: string[];
	notes: { n: number; text: string; unverified: boolean }[];
	glossary: [string, string][];
}
