/**
 * What the shelf engine returns. Plain data, SI units (metres, newtons, pascals, N·m, N·m²),
 * finite numbers only; `null` where a figure has no meaning (the ratio of a shelf that does not sag).
 * The request shapes live in src/lib/schemas/shelf.ts and are re-exported from index.ts.
 */

export type WarningCode =
	| 'over-200-lb'
	| 'across-grain'
	| 'fixed-ends'
	| 'cantilever'
	| 'overstressed'
	| 'not-for-wet-service'
	| 'thickness-not-stocked'
	| 'uplift'
	| 'estimate'
	| 'deep-strip';

export interface ShelfWarning {
	code: WarningCode;
	/** one plain sentence for the reader */
	message: string;
	/** where the rule or figure comes from */
	source?: string;
}

export interface Reaction {
	/** position of the support from the left end, m */
	at: number;
	/** upward force the support gives, N */
	force: number;
	/** moment the support gives (fixed ends and the wall of a cantilever), N·m; hogging negative */
	moment: number;
}

export interface SpanCheck {
	/** left and right ends of this span, m */
	from: number;
	to: number;
	/** largest sag within the span (long-term if creep counts, else instant), m */
	sag: number;
	/** where that sag is, m from the left end */
	at: number;
	allowed: number;
	pass: boolean;
}

export interface ShelfResult {
	engineVersion: string;
	/** total length of the shelf along its span(s), m */
	span: number;
	/** supports from left to right, m */
	supports: number[];
	sag: {
		/** under all loads the moment they are applied, m */
		instant: number;
		/** after creep under the permanent part of the load, m */
		longTerm: number;
		/** where the governing sag is, m from the left end */
		at: number;
		/** the part of the instant sag due to bending, and due to shear, m */
		bending: number;
		shear: number;
		/** instant sag from the shelf's own weight alone, m */
		selfWeight: number;
		/** which sag is checked against the limit */
		checked: 'instant' | 'longTerm';
		/** long-term over instant sag under permanent load for this section and service */
		creepFactor: number;
	};
	limit: {
		name: string;
		/** sag allowed in the governing span, m */
		allowed: number;
		pass: boolean;
		/** (allowed − sag) / allowed: 0.25 = a quarter to spare, negative = over by that share */
		margin: number;
		/** where the limit comes from */
		source: string;
		spans: SpanCheck[];
	};
	/** governing span over its sag, e.g. 250 for L/250; null when the shelf does not sag */
	ratio: number | null;
	/** instant bending stiffness of the whole section EI, N·m² */
	stiffness: number;
	/** long-term (creep-reduced) bending stiffness, N·m² */
	stiffnessLongTerm: number;
	/** shear stiffness κGA, N */
	shearStiffness: number;
	/** largest bending moment (absolute), N·m, and where */
	moment: number;
	momentAt: number;
	/** largest bending stress in the panel, Pa */
	stress: number;
	strength: {
		/** modulus of rupture of the part that is most highly used, Pa */
		rupture: number;
		safetyFactor: number;
		/** rupture / safety factor, Pa */
		allowed: number;
		/** highest stress / allowed over all parts of the section (1 = at the allowed stress) */
		utilisation: number;
		pass: boolean;
		/** which part governs: 'panel' or the side of a strip */
		governing: string;
	};
	reactions: Reaction[];
	/** deflected shape [x, sag] in metres, sag downward positive, long-term when creep counts */
	curve: [number, number][];
	load: {
		/** all loads on the shelf including its own weight, N */
		total: number;
		/** the shelf's own weight, N */
		selfWeight: number;
		/** total of the applied loads without self-weight, N */
		applied: number;
	};
	section: {
		/** height of the neutral axis below the panel top, m */
		neutralAxis: number;
		/** area of the whole section, m² */
		area: number;
		/** effective modulus of the panel used, Pa */
		panelModulus: number;
	};
	material: { id: string | null; name: string };
	warnings: ShelfWarning[];
}

/** Where a request went wrong: the field and what was expected. */
export interface ShelfIssue {
	path: (string | number)[];
	message: string;
}

export type SafeResult<T> = { ok: true; result: T } | { ok: false; issues: ShelfIssue[] };
