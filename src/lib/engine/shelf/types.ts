/**
 * What the shelf engine takes and returns. Plain data, SI units (metres, newtons, pascals, N·m,
 * N·m²), finite numbers only; `null` where a figure has no meaning (the ratio of a shelf that does
 * not sag). People and programs write requests with quantity strings; src/lib/schemas/shelf.ts
 * reads them into these input types.
 */

/** A material given by its figures, SI. */
export interface CustomMaterial {
	name: string;
	/** modulus of elasticity with the grain (or of the panel's face grain), Pa */
	modulus: number;
	/** modulus across the grain, Pa; when absent the material is taken as the same both ways */
	modulusAcross?: number;
	/** modulus of rupture (bending strength), Pa */
	rupture: number;
	/** kg/m³ */
	density: number;
	shearModulus?: number;
	/** long-term sag over instant sag under permanent load, e.g. 1.6 (at least 1) */
	creepFactor?: number;
}

/** A library id (reference/materials.ts) or a material given by its figures. */
export type ShelfMaterialInput = string | CustomMaterial;

export type SupportInput =
	| 'simple'
	| 'fixed'
	| 'cantilever'
	| {
			/**
			 * lengths of the spans, left to right (a shelf over dividers), m: clear spans between the
			 * faces of the supports when `divider` is given, else from support to support
			 */
			spans: number[];
			/** how the two outer ends are held */
			ends: 'simple' | 'fixed';
			/**
			 * thickness of each divider, m. The shelf is taken as resting on a line at the divider's
			 * centre, so each span next to a divider is checked over half its thickness more (the
			 * longer span, the safe side); absent in analyses saved before it was asked for
			 */
			divider?: number;
	  };

/** Pa over the whole top; N/m along the shelf (from/to in m from the left end); N at a point. */
export type LoadInput =
	| { kind: 'area'; pressure: number }
	| { kind: 'line'; intensity: number; from?: number; to?: number }
	| { kind: 'point'; force: number; at: number };

export interface EdgeInput {
	/** front or back: glued to that edge, top flush with the panel; below: a cleat under it */
	side: 'front' | 'back' | 'below';
	material: ShelfMaterialInput;
	/** vertical size of the strip, m */
	height: number;
	/** horizontal size of the strip, across the shelf's depth, m */
	thickness: number;
}

/** The deflection limits offered by name (limits.ts has the one list, with each one's source). */
export type NamedLimit = 'L/144' | '1/16in-per-ft' | 'L/240' | 'L/360';
/** a named limit, L/n (with where it comes from when it is not the user's choice), or a length */
export type LimitInput = NamedLimit | { ratio: number; source?: string } | { length: number };

export interface ShelfOptions {
	/** add shear deflection to bending */
	shearDeflection: boolean;
	/** divide the modulus of rupture by this to get the allowed bending stress */
	safetyFactor: number;
	/** points on the deflected curve of the result: 0 for none, otherwise at least 2 (the forms
	 * and the request schema take 101 to 2001; the compute API's `curve` query asks for fewer) */
	curvePoints: number;
}

export const DEFAULT_SHELF_OPTIONS: ShelfOptions = {
	shearDeflection: true,
	safetyFactor: 3,
	curvePoints: 101
};

/** One shelf, SI. The span may be left out when the support gives the spans. */
export interface ShelfInput {
	span?: number;
	depth: number;
	thickness: number;
	material: ShelfMaterialInput;
	/** face grain (or wood grain) along the span or across it */
	grain: 'along' | 'across';
	support: SupportInput;
	loads: LoadInput[];
	selfWeight: boolean;
	edges: EdgeInput[];
	/** long: the loads stay for months or years (books), so creep counts; short: brief loads */
	duration: 'short' | 'long';
	/** dry: heated indoor room; humid: unheated or damp room; wet: exposed to weather */
	service: 'dry' | 'humid' | 'wet';
	limit: LimitInput;
	options: ShelfOptions;
}

/** maxSpan: the span is what is sought (for several spans, their proportions are kept). */
export type MaxSpanInput = ShelfInput;

/** minThickness: the thickness is what is sought, from the stocked or the given thicknesses. */
export interface MinThicknessInput extends Omit<ShelfInput, 'thickness'> {
	thickness?: number;
	candidates?: number[];
}

/** minEdge: the smallest height of a strip of given thickness and material that meets the limit. */
export interface MinEdgeInput extends ShelfInput {
	strip: Omit<EdgeInput, 'height'> & {
		/** tallest strip worth trying, m */
		maxHeight?: number;
	};
}

/** maxLoad: the largest magnitude of one load of the given shape (other loads stay as given). */
export interface MaxLoadInput extends ShelfInput {
	load:
		{ kind: 'area' } | { kind: 'line'; from?: number; to?: number } | { kind: 'point'; at: number };
}

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
export type { InputIssue } from '../errors';
import type { InputIssue } from '../errors';

export type SafeResult<T> = { ok: true; result: T } | { ok: false; issues: InputIssue[] };
