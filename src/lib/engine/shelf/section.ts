/**
 * The cross-section of a shelf: a rectangular panel, optionally with glued strips at the front,
 * the back or below, each of its own material, combined by the transformed-section method
 * (parallel-axis theorem about the composite neutral axis; any mechanics of materials text).
 * y is measured downward from the top of the panel.
 */

/** One rectangle of the section with its material figures already chosen. */
export interface SectionPart {
	name: string;
	/** horizontal size (across the depth of the shelf), m */
	width: number;
	/** vertical size, m */
	height: number;
	/** depth of its top below the top of the panel, m */
	top: number;
	modulusPa: number;
	shearModulusPa: number;
	densityKgM3: number;
	rupturePa: number;
	/** Eurocode 5 k_def for the service class in force */
	kdef: number;
}

export interface SectionProperties {
	/** instant bending stiffness EI, N·m² */
	ei: number;
	/** long-term bending stiffness, each part's E reduced to E/(1 + k_def) (EN 1995-1-1 §2.3.2.2) */
	eiLongTerm: number;
	/** shear stiffness κGA, N, with κ = 5/6 for rectangles, parts acting side by side */
	ga: number;
	gaLongTerm: number;
	/** neutral axis below the panel top, m */
	neutralAxis: number;
	area: number;
	/** weight per metre of length, N/m */
	weightPerM: number;
	parts: SectionPart[];
}

/** Shear correction factor of a rectangle, 5/6 (Timoshenko beam theory). */
export const SHEAR_CORRECTION_RECTANGLE = 5 / 6;

/** EI and the neutral axis of the parts with their moduli given as instant (E) or long-term
 * (E/(1 + k_def)). Written with multiplications and without a callback: it runs on every step of
 * the thickness and strip searches. */
function bending(parts: SectionPart[], longTerm: boolean) {
	let ea = 0;
	let eay = 0;
	for (let i = 0; i < parts.length; i++) {
		const p = parts[i];
		const e = (longTerm ? p.modulusPa / (1 + p.kdef) : p.modulusPa) * p.width * p.height;
		ea += e;
		eay += e * (p.top + p.height / 2);
	}
	const na = eay / ea;
	let ei = 0;
	for (let i = 0; i < parts.length; i++) {
		const p = parts[i];
		const d = p.top + p.height / 2 - na;
		const h = p.height;
		const modulus = longTerm ? p.modulusPa / (1 + p.kdef) : p.modulusPa;
		ei += modulus * ((p.width * (h * h * h)) / 12 + p.width * h * d * d);
	}
	return { ei, na };
}

export function sectionProperties(parts: SectionPart[], gravity: number): SectionProperties {
	const instant = bending(parts, false);
	const longTerm = bending(parts, true);
	let ga = 0;
	let gaLong = 0;
	let area = 0;
	let weight = 0;
	for (let i = 0; i < parts.length; i++) {
		const p = parts[i];
		const a = p.width * p.height;
		ga += SHEAR_CORRECTION_RECTANGLE * p.shearModulusPa * a;
		gaLong += (SHEAR_CORRECTION_RECTANGLE * p.shearModulusPa * a) / (1 + p.kdef);
		area += a;
		weight += p.densityKgM3 * gravity * a;
	}
	return {
		ei: instant.ei,
		eiLongTerm: longTerm.ei,
		ga,
		gaLongTerm: gaLong,
		neutralAxis: instant.na,
		area,
		weightPerM: weight,
		parts
	};
}

/** Largest bending stress in each part under moment M (instant stiffness distribution), Pa. */
export function partStresses(section: SectionProperties, moment: number): number[] {
	const m = Math.abs(moment);
	return section.parts.map((p) => {
		const far = Math.max(
			Math.abs(p.top - section.neutralAxis),
			Math.abs(p.top + p.height - section.neutralAxis)
		);
		return (m * p.modulusPa * far) / section.ei;
	});
}
