/**
 * The joint screen's form: the texts as typed, the engine's request they make, and a stored
 * (validated, SI) joint back into texts in the reader's unit. A bare length is read in the
 * reader's unit (inches or mm), a bare load in their force unit (lbf or N).
 */
import { STOCK_HOLDING } from '../../../reference/stock-holding';
import { exactForceText, exactLengthText } from './exact-text';
import type { FastenerKind, JointKind } from '../engine/joinery/types';
import type { JointInput } from '../schemas/joinery';
import { withUnitMark } from '../components/quantity-input/reading';
import { loadUnitsFor, type UserLengthUnit } from './lengths';

export interface JointDraft {
	kind: JointKind;
	fastener: FastenerKind;
	/** along the meeting line, usually the shelf depth */
	length: string;
	endMaterial: string;
	endThickness: string;
	faceMaterial: string;
	faceThickness: string;
	/** what the joint carries: the shelf's reaction at this end */
	load: string;
	/** a number of fasteners to check instead of planning it; '' to plan */
	count: string;
}

export const JOINT_KINDS: [JointKind, string, string, string][] = [
	['shelf-to-side', 'A fixed shelf into a case side', 'Shelf', 'Case side'],
	['top-to-side', 'A top onto a case side', 'Top', 'Case side'],
	['bottom-to-side', 'A bottom into a case side', 'Bottom', 'Case side'],
	['rail-to-stile', 'A face-frame rail into a stile', 'Rail', 'Stile'],
	['frame-to-case', 'A face frame onto the case', 'Face frame', 'Case edge'],
	['divider-to-shelf', 'A divider onto a shelf', 'Divider', 'Shelf']
];

export const FASTENERS: [FastenerKind, string][] = [
	['pocket-screw', 'Pocket screws'],
	['biscuit', 'Biscuits'],
	['screw', 'Screws through the face'],
	['shelf-pin', 'Shelf pins'],
	['dado', 'A dado (housing)']
];

export const STOCKS = STOCK_HOLDING.map((s) => ({ id: s.id, name: s.name }));

/** The two pieces' names for this kind of joint: ['Shelf', 'Case side']. */
export function pieceNames(kind: JointKind): [string, string] {
	const row = JOINT_KINDS.find((k) => k[0] === kind);
	return row ? [row[2], row[3]] : ['End piece', 'Face piece'];
}

/** A fixed 3/4" plywood shelf into a case side with pocket screws, carrying 60 lbf (an example). */
export function defaultJointDraft(unit: UserLengthUnit): JointDraft {
	const mm = unit === 'mm';
	return {
		kind: 'shelf-to-side',
		fastener: 'pocket-screw',
		length: mm ? '286 mm' : '11 1/4"',
		endMaterial: 'hardwood-plywood-veneer-core',
		endThickness: mm ? '18 mm' : '23/32"',
		faceMaterial: 'hardwood-plywood-veneer-core',
		faceThickness: mm ? '18 mm' : '23/32"',
		load: mm ? '270 N' : '60 lbf',
		count: ''
	};
}

const BARE_NUMBER = /^\d+(?:\.\d*)?$|^\.\d+$/;

/** A force as typed; a bare number in the reader's force unit. */
export function forceText(text: string, unit: UserLengthUnit): string {
	const t = text.trim();
	return BARE_NUMBER.test(t) ? `${t} ${loadUnitsFor(unit).force}` : t;
}

/** The joint request of a draft; unreadable texts pass through so the schema names them. */
export function toJointInput(d: JointDraft, unit: UserLengthUnit): JointInput {
	const count = d.count.trim() === '' ? undefined : Number(d.count);
	return {
		kind: d.kind,
		fastener: d.fastener,
		length: withUnitMark(d.length, unit),
		endPiece: { material: d.endMaterial, thickness: withUnitMark(d.endThickness, unit) },
		facePiece: { material: d.faceMaterial, thickness: withUnitMark(d.faceThickness, unit) },
		demand: d.load.trim() === '' ? undefined : { shear: forceText(d.load, unit) },
		options: count === undefined ? undefined : { count }
	};
}

type Stored = Partial<Record<string, unknown>>;
const record = (v: unknown): Stored => (v && typeof v === 'object' ? (v as Stored) : {});

/** A stored joint (SI numbers) back into the form's texts, in the reader's unit. */
export function fromJointInput(input: unknown, unit: UserLengthUnit): JointDraft {
	const d = defaultJointDraft(unit);
	const s = record(input);
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? exactLengthText(v, unit) : fallback;
	if (JOINT_KINDS.some((k) => k[0] === s.kind)) d.kind = s.kind as JointKind;
	if (FASTENERS.some((f) => f[0] === s.fastener)) d.fastener = s.fastener as FastenerKind;
	d.length = L(s.length, d.length);
	const end = record(s.endPiece);
	const face = record(s.facePiece);
	if (typeof end.material === 'string') d.endMaterial = end.material;
	if (typeof face.material === 'string') d.faceMaterial = face.material;
	d.endThickness = L(end.thickness, d.endThickness);
	d.faceThickness = L(face.thickness, d.faceThickness);
	const shear = record(s.demand).shear;
	d.load = typeof shear === 'number' ? exactForceText(shear, unit) : '';
	const count = record(s.options).count;
	d.count = typeof count === 'number' ? String(count) : '';
	return d;
}

/** Which form field an issue belongs to (issues are paths into the joint request). */
export function jointFieldOf(path: (string | number)[]): keyof JointDraft | 'form' {
	const [head, sub] = path;
	if (head === 'length') return 'length';
	if (head === 'endPiece') return sub === 'material' ? 'endMaterial' : 'endThickness';
	if (head === 'facePiece') return sub === 'material' ? 'faceMaterial' : 'faceThickness';
	if (head === 'demand') return 'load';
	if (head === 'options') return 'count';
	if (head === 'kind' || head === 'fastener') return head;
	return 'form';
}

export const JOINT_FIELD_PLACES: Partial<Record<keyof JointDraft, { id: string; label: string }>> =
	{
		length: { id: 'joint-length', label: 'Length of the joint' },
		endThickness: { id: 'joint-end-thickness', label: 'Thickness of the first piece' },
		faceThickness: { id: 'joint-face-thickness', label: 'Thickness of the second piece' },
		load: { id: 'joint-load', label: 'Load on the joint' },
		count: { id: 'joint-count', label: 'Number of fasteners' },
		fastener: { id: 'joint-fastener', label: 'Fastener' }
	};
