/**
 * A stored case design (validated by caseDesignSchema, so SI numbers) back into the designer's
 * form texts, in the reader's unit. Parts the form does not edit are kept aside and written back.
 */
import type { CaseDesignInput } from '../schemas/case';
import { formatQuantityExact } from '../engine/units/quantity';
import { lengthText, type UserLengthUnit } from '../workbench/lengths';
import { RETIRED_LIMIT_NOTE } from '../workbench/shelf-draft';
import { RETIRED_PER_FOOT_AS_RATIO, RETIRED_PER_FOOT_LIMIT } from '../schemas/shelf';
import {
	defaultCase,
	LIMITS,
	newShelf,
	type AnchorChoice,
	type CaseDraft,
	type CaseLimit,
	type EndDraft,
	type JointChoice,
	type ShelfRowDraft
} from './draft';

const OAK = 'red-oak';

type Stored = Record<string, unknown>;
const obj = (v: unknown): Stored | undefined =>
	v && typeof v === 'object' && !Array.isArray(v) ? (v as Stored) : undefined;

/** A stored design (validated, SI numbers) back into the form's texts, in the reader's unit. */
export function fromDesign(input: unknown, unit: UserLengthUnit): CaseDraft {
	const d = defaultCase(unit);
	const s = obj(input);
	if (!s) return d;
	const L = (v: unknown, fallback: string) =>
		typeof v === 'number' ? lengthText(v, unit) : typeof v === 'string' ? v : fallback;
	const M = (v: unknown, fallback: string) => (typeof v === 'string' ? v : fallback);
	const end = (v: unknown): EndDraft => {
		const e = obj(v) ?? {};
		return {
			material: M(e.material, ''),
			thickness: L(e.thickness, ''),
			joint: (e.joint as JointChoice) ?? 'biscuit',
			jointCount: typeof e.jointCount === 'number' ? e.jointCount : null
		};
	};
	d.width = L(s.width, d.width);
	d.height = L(s.height, d.height);
	d.depth = L(s.depth, d.depth);
	const sides = obj(s.sides) ?? {};
	d.sides = {
		material: M(sides.material, d.sides.material),
		thickness: L(sides.thickness, d.sides.thickness)
	};
	d.top = end(s.top);
	d.bottom = end(s.bottom);
	const back = obj(s.back);
	d.back = back
		? {
				on: true,
				material: M(back.material, d.back.material),
				thickness: L(back.thickness, d.back.thickness),
				fitted: back.fitted === 'applied' ? 'applied' : 'rabbet'
			}
		: { ...d.back, on: false };
	d.shelves = (Array.isArray(s.shelves) ? s.shelves : []).map((raw) => {
		const r = obj(raw) ?? {};
		const loads = (Array.isArray(r.loads) ? r.loads : []) as Stored[];
		const spread = loads.findIndex((l) => l?.kind === 'area');
		const row = newShelf(unit, L(r.height, ''));
		const nosing = obj(r.nosing);
		return {
			...row,
			name: typeof r.name === 'string' ? r.name : '',
			kind: r.kind === 'fixed' ? 'fixed' : 'adjustable',
			material: M(r.material, ''),
			thickness: L(r.thickness, ''),
			joint: (r.joint as JointChoice) ?? 'biscuit',
			jointCount: typeof r.jointCount === 'number' ? r.jointCount : null,
			ends: r.ends === 'fixed' ? 'fixed' : 'simple',
			load: spread >= 0 ? pressureText(loads[spread].pressure, unit) : '',
			nosing: nosing
				? {
						on: true,
						material: M(nosing.material, OAK),
						height: L(nosing.height, row.nosing.height),
						thickness: L(nosing.thickness, row.nosing.thickness)
					}
				: // a new shelf row has a nosing; a stored shelf without one reopens without
					{ ...row.nosing, on: false },
			otherLoads: loads.filter((_, i) => i !== spread)
		} satisfies ShelfRowDraft;
	});
	const frame = obj(s.faceFrame);
	d.faceFrame = frame
		? {
				on: true,
				material: M(frame.material, d.faceFrame.material),
				thickness: L(frame.thickness, d.faceFrame.thickness),
				stileWidth: L(frame.stileWidth, d.faceFrame.stileWidth),
				railWidth: L(frame.railWidth, d.faceFrame.railWidth),
				joint: frame.joint === 'biscuit' ? 'biscuit' : 'pocket-screw',
				attach: frame.attach === 'pocket-screw' ? 'pocket-screw' : 'biscuit'
			}
		: { ...d.faceFrame, on: false };
	const base = obj(s.base);
	d.base = base
		? { on: true, height: L(base.height ?? 0, '0'), setback: L(base.setback ?? 0, '0') }
		: { ...d.base, on: false };
	const anchoring = obj(s.anchoring);
	d.anchoring = {
		kind: (anchoring?.kind as AnchorChoice) ?? 'none',
		intoStuds: anchoring?.intoStuds === true
	};
	d.seismicRegion = s.seismicRegion === true;
	if ((LIMITS as readonly unknown[]).includes(s.limit)) d.limit = s.limit as CaseLimit;
	const ratio = obj(s.limit)?.ratio;
	if (typeof ratio === 'number') d.limit = `L/${ratio}`;
	if (s.limit === RETIRED_PER_FOOT_LIMIT) {
		d.limit = `L/${RETIRED_PER_FOOT_AS_RATIO.ratio}`;
		d.limitNote = RETIRED_LIMIT_NOTE;
	}
	if (s.service === 'humid' || s.service === 'wet') d.service = s.service;
	else d.service = 'dry';
	d.kept = {
		...(typeof s.name === 'string' ? { name: s.name } : {}),
		...(Array.isArray(s.drawers) ? { drawers: s.drawers as CaseDesignInput['drawers'] } : {}),
		...(Array.isArray(s.doors) ? { doors: s.doors as CaseDesignInput['doors'] } : {}),
		...(typeof s.floorTiltDeg === 'number' ? { floorTiltDeg: s.floorTiltDeg } : {}),
		...(anchoring && anchoring.height !== undefined
			? { anchorHeight: anchoring.height as string | number }
			: {})
	};
	return d;
}

/** A stored pressure (pascals) as the user would type it; a stored text as it was. */
function pressureText(v: unknown, unit: UserLengthUnit): string {
	if (typeof v === 'string') return v;
	if (typeof v !== 'number') return '';
	return formatQuantityExact(v, 'pressure', unit === 'mm' ? 'kPa' : 'lbf/ft²');
}
