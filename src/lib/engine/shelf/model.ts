/**
 * From a validated request (SI numbers) to the model the beam solver works on: materials chosen,
 * section built, supports and loads laid out. Problems a schema cannot see (an unknown material,
 * solid wood across the grain) become InputError issues naming the field.
 */
import {
	CUSTOM_CREEP_FACTOR,
	findMaterial,
	type ShelfMaterial,
	type StockThickness
} from '../../../../reference/materials';
import type { BeamLoads, EndCondition } from './beam';
import { InputError, type InputIssue } from '../errors';
import { deflectionLimit, type DeflectionLimit } from './limits';
import { STANDARD_GRAVITY } from '../units/si';
import { sectionProperties, type SectionPart, type SectionProperties } from './section';
import type { EdgeInput, ShelfInput, ShelfWarning } from './types';

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
	input: ShelfInput;
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

function fromLibrary(m: ShelfMaterial): ResolvedMaterial {
	return { ...m, kind: m.kind };
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
		return fromLibrary(found);
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
	issues: InputIssue[],
	warnings: ShelfWarning[]
): SectionPart | undefined {
	const m = resolveMaterial(edge.material, ['edges', index, 'material'], issues);
	if (!m) return undefined;
	const name = `${edge.side} strip`;
	const top = edge.side === 'below' ? input.thickness : 0;
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

/** Lay out a validated request; throws InputError for problems the schema cannot see. */
export function buildModel(input: ShelfInput): ShelfModel {
	const issues: InputIssue[] = [];
	const warnings: ShelfWarning[] = [];
	const panel = resolveMaterial(input.material, ['material'], issues);
	const edgeParts = input.edges.map((e, i) => edgePart(e, i, input, issues, warnings));
	if (panel && input.grain === 'across' && panel.modulusAcrossPa === null)
		issues.push({
			path: ['grain'],
			message: `${panel.name} is a board: its grain runs along the span. Expected "along", or choose a panel.`
		});
	if (!panel || issues.length) throw new InputError(issues);

	const along = input.grain === 'along';
	const stock = stockAt(panel, input.thickness);
	const modulus = along
		? (stock?.modulusAlongPa ?? alongModulus(panel, input))
		: (stock?.modulusAcrossPa ?? panel.modulusAcrossPa!);
	const panelPart: SectionPart = {
		name: 'panel',
		width: input.depth,
		height: input.thickness,
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

	return layOut(input, section, panel, deflectionLimit(input.limit), warnings);
}

const ENDS: Record<'simple' | 'fixed' | 'cantilever', [EndCondition, EndCondition]> = {
	simple: ['pin', 'pin'],
	fixed: ['fixed', 'fixed'],
	cantilever: ['fixed', 'free']
};

/** The parts of a model that hang on the spans, supports and loads, around a built section. */
function layOut(
	input: ShelfInput,
	section: SectionProperties,
	panel: ResolvedMaterial,
	limit: DeflectionLimit,
	warnings: ShelfWarning[]
): ShelfModel {
	const support = input.support;
	const spans = typeof support === 'object' ? support.spans : [input.span ?? Number.NaN];
	const length = spans.reduce((a, b) => a + b, 0);
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
	for (const load of input.loads) {
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
 * The model of an input that differs from the model's own only in span, spans or loads: the
 * section, materials and limit are kept, the rest laid out again. What a solver varying the
 * span or a load calls on every step (same numbers as buildModel of that input).
 */
export function relayOut(model: ShelfModel, input: ShelfInput): ShelfModel {
	return layOut(input, model.section, model.panel, model.limit, model.warnings);
}

export function isStocked(model: ShelfModel): boolean {
	return model.panel.kind === 'custom' || stockAt(model.panel, model.input.thickness) !== undefined;
}
