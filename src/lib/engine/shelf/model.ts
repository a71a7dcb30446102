/**
 * From a validated request (SI numbers) to the model the beam solver works on: materials chosen,
 * section built, supports and loads laid out. Problems a schema cannot see (an unknown material,
 * solid wood across the grain) become InputError issues naming the field.
 */
import {
	CUSTOM_CREEP_FACTOR,
	findMaterial,
	type StockThickness
} from '../../../../reference/materials';
import type { BeamLoads, EndCondition } from './beam';
import { InputError, type InputIssue } from '../errors';
import { deflectionLimit, type DeflectionLimit } from './limits';
import { STANDARD_GRAVITY } from '../units/si';
import { sectionProperties, type SectionPart, type SectionProperties } from './section';
import type { EdgeInput, ShelfInput, ShelfWarning } from './types';
import { centreSpans } from './validate';

const SERVICE_CLASS = { dry: 0, humid: 1, wet: 2 } as const;
/** A thickness within this of a stocked one is taken as that stock (sheet goods vary about so). */
const STOCK_TOLERANCE_M = 0.0003;

export interface ResolvedMaterial {
	id: string | null;
	name: string;
	kind: 'solid' | 'panel' | 'custom';
	modulusAlongPa: number;
	/** free of shear deflection: the start when the engine adds shear itself (see reference/materials) */
	bendingOnlyModulusAlongPa: number;
	modulusAcrossPa: number | null;
	ruptureAlongPa: number;
	ruptureAcrossPa: number | null;
	densityKgM3: number;
	shearModulusPa: number;
	/** k_def by service class dry / humid / wet (null: the source gives none) */
	creep: readonly (number | null)[];
	thicknesses: StockThickness[];
}

export interface ShelfModel {
	/** the request as given; a solver's model keeps the one it started from, and its spans,
	 * thickness and loads are the model's own (below) */
	input: ShelfInput;
	/** actual thickness of the panel, m */
	thickness: number;
	spans: number[];
	length: number;
	left: EndCondition;
	right: EndCondition;
	inner: number[];
	section: SectionProperties;
	panel: ResolvedMaterial;
	applied: BeamLoads;
	selfWeight: BeamLoads;
	limit: DeflectionLimit;
	warnings: ShelfWarning[];
}

export function resolveMaterial(
	material: ShelfInput['material'],
	path: (string | number)[],
	issues: InputIssue[]
): ResolvedMaterial | undefined {
	if (typeof material === 'string') {
		const found = findMaterial(material);
		if (!found) {
			issues.push({
				path,
				message: `Unknown material "${material}": expected a library id (GET /api/v1/materials) or { name, modulus, rupture, density }.`
			});
			return undefined;
		}
		return found;
	}
	const kdef = (material.creepFactor ?? CUSTOM_CREEP_FACTOR) - 1;
	return {
		id: null,
		name: material.name,
		kind: 'custom',
		modulusAlongPa: material.modulus,
		// a user's own figure is taken as given, with or without shear added
		bendingOnlyModulusAlongPa: material.modulus,
		modulusAcrossPa: material.modulusAcross ?? material.modulus,
		ruptureAlongPa: material.rupture,
		ruptureAcrossPa: material.rupture,
		densityKgM3: material.density,
		shearModulusPa: material.shearModulus ?? material.modulus / 16, // G ≈ E/16, common assumption
		creep: [kdef, kdef, kdef],
		thicknesses: []
	};
}

function stockAt(m: ResolvedMaterial, thickness: number): StockThickness | undefined {
	return m.thicknesses.find((t) => Math.abs(t.actualM - thickness) <= STOCK_TOLERANCE_M);
}

function kdefFor(
	m: ResolvedMaterial,
	service: ShelfInput['service'],
	warnings: ShelfWarning[],
	part: string
) {
	const cls = SERVICE_CLASS[service];
	const k = m.creep[cls];
	if (k !== null && k !== undefined) return k;
	const known = m.creep.filter((c): c is number => c !== null);
	warnings.push({
		code: 'not-for-wet-service',
		message: `${part}: ${m.name} is not rated for ${service} service; the creep figure for drier service is used and real creep will be larger.`,
		source:
			'Eurocode 5 (EN 1995-1-1) Table 3.2 gives no k_def for this material in that service class'
	});
	return Math.max(...known);
}

/**
 * The modulus along the grain the section is built with. When the engine adds shear deflection
 * itself it starts from the bending-only modulus (clear-wood figures of the Wood Handbook's Table
 * 5-3a include shear: counting it again would count it twice); without shear it uses the
 * published figure, which already carries it.
 */
function alongModulus(m: ResolvedMaterial, input: ShelfInput): number {
	return input.options.shearDeflection ? m.bendingOnlyModulusAlongPa : m.modulusAlongPa;
}

function edgePart(
	edge: EdgeInput,
	index: number,
	input: ShelfInput,
	thickness: number,
	issues: InputIssue[],
	warnings: ShelfWarning[]
): SectionPart | undefined {
	const m = resolveMaterial(edge.material, ['edges', index, 'material'], issues);
	if (!m) return undefined;
	const name = `${edge.side} strip`;
	const top = edge.side === 'below' ? thickness : 0;
	return {
		name,
		width: edge.thickness,
		height: edge.height,
		top,
		// strips run with their grain along the shelf
		modulusPa: alongModulus(m, input),
		shearModulusPa: m.shearModulusPa,
		densityKgM3: m.densityKgM3,
		rupturePa: m.ruptureAlongPa,
		kdef: kdefFor(m, input.service, warnings, name)
	};
}

/**
 * Lay out a validated request; throws InputError for problems the schema cannot see. A solver
 * varying the thickness or the strips passes them here instead of building a request for each try
 * (the model is the same as buildModel of that request).
 */
export function buildModel(
	input: ShelfInput,
	thickness = input.thickness,
	edges = input.edges
): ShelfModel {
	const issues: InputIssue[] = [];
	const warnings: ShelfWarning[] = [];
	const panel = resolveMaterial(input.material, ['material'], issues);
	const edgeParts: (SectionPart | undefined)[] = [];
	for (let i = 0; i < edges.length; i++)
		edgeParts.push(edgePart(edges[i], i, input, thickness, issues, warnings));
	if (panel && input.grain === 'across' && panel.modulusAcrossPa === null)
		issues.push({
			path: ['grain'],
			message: `${panel.name} is a board: its grain runs along the span. Expected "along", or choose a panel.`
		});
	if (!panel || issues.length) throw new InputError(issues);

	const along = input.grain === 'along';
	const stock = stockAt(panel, thickness);
	const modulus = along
		? (stock?.modulusAlongPa ?? alongModulus(panel, input))
		: (stock?.modulusAcrossPa ?? panel.modulusAcrossPa!);
	const panelPart: SectionPart = {
		name: 'panel',
		width: input.depth,
		height: thickness,
		top: 0,
		modulusPa: modulus,
		shearModulusPa: panel.shearModulusPa,
		densityKgM3: panel.densityKgM3,
		rupturePa: along ? panel.ruptureAlongPa : (panel.ruptureAcrossPa ?? panel.ruptureAlongPa),
		kdef: kdefFor(panel, input.service, warnings, 'panel')
	};
	const section = sectionProperties(
		[panelPart, ...edgeParts.filter((p): p is SectionPart => p !== undefined)],
		STANDARD_GRAVITY
	);

	const spans = spansOf(input);
	return layOut(input, thickness, section, panel, deflectionLimit(input.limit), warnings, spans);
}

const ENDS: Record<'simple' | 'fixed' | 'cantilever', [EndCondition, EndCondition]> = {
	simple: ['pin', 'pin'],
	fixed: ['fixed', 'fixed'],
	cantilever: ['fixed', 'free']
};

/** The spans of a request as given (clear spans over dividers), left to right, m. */
export function spansOf(input: ShelfInput): number[] {
	return typeof input.support === 'object' ? input.support.spans : [input.span ?? Number.NaN];
}

/** The parts of a model that hang on the spans, supports and loads, around a built section. */
function layOut(
	input: ShelfInput,
	thickness: number,
	section: SectionProperties,
	panel: ResolvedMaterial,
	limit: DeflectionLimit,
	warnings: ShelfWarning[],
	clear: number[],
	loads = input.loads
): ShelfModel {
	const support = input.support;
	// over dividers the spans given are clear spans; the beam runs between the dividers' centres
	const spans =
		typeof support === 'object' && support.divider
			? centreSpans({ spans: clear, divider: support.divider })
			: clear;
	let length = 0;
	for (const l of spans) length += l;
	const inner: number[] = [];
	for (let i = 0, x = 0; i < spans.length - 1; i++) inner.push((x += spans[i]));
	const [left, right] =
		typeof support === 'object'
			? support.ends === 'fixed'
				? ENDS.fixed
				: ENDS.simple
			: ENDS[support];

	// a span so short that its allowed sag rounds to nothing cannot be checked (a margin of 0/0)
	const issues: InputIssue[] = [];
	spans.forEach((l, i) => {
		if (!(limit.allowed(l) > 0))
			issues.push({
				path: typeof support === 'object' ? ['support', 'spans', i] : ['span'],
				message: 'Too short to check against the limit: expected a span of at least a millimetre.'
			});
	});
	if (issues.length) throw new InputError(issues);

	const applied: BeamLoads = { points: [], udls: [] };
	for (const load of loads) {
		if (load.kind === 'area')
			applied.udls.push({ from: 0, to: length, w: load.pressure * input.depth });
		else if (load.kind === 'line') {
			const from = load.from ?? 0;
			const to = Math.min(load.to ?? length, length);
			if (to > from) applied.udls.push({ from, to, w: load.intensity });
		} else applied.points.push({ at: load.at, force: load.force });
	}
	const selfWeight: BeamLoads = input.selfWeight
		? { points: [], udls: [{ from: 0, to: length, w: section.weightPerM }] }
		: { points: [], udls: [] };

	return {
		input,
		thickness,
		spans,
		length,
		left,
		right,
		inner,
		section,
		panel,
		applied,
		selfWeight,
		limit,
		warnings
	};
}

/**
 * The model with other spans (the same number of them) or other loads: the section, materials
 * and limit are kept, the rest laid out again. What a solver varying the span or a load calls on
 * every step (the same numbers as buildModel of a request with those spans and loads).
 */
export function relayOut(
	model: ShelfModel,
	spans: number[],
	loads = model.input.loads
): ShelfModel {
	const { input, thickness, section, panel, limit, warnings } = model;
	return layOut(input, thickness, section, panel, limit, warnings, spans, loads);
}

export function isStocked(model: ShelfModel): boolean {
	return model.panel.kind === 'custom' || stockAt(model.panel, model.thickness) !== undefined;
}
