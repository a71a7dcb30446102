import type { Actor } from '../../../src/lib/server/access';
import { createAnalysis } from '../../../src/lib/server/analyses';

/**
 * A shelf worked by hand: simply supported, 1 m span, 250 mm × 20 mm panel of a material given
 * by its figures (E = 10 GPa, invented for the test), 100 N at mid-span, own weight, shear and
 * creep left out. EI = 10e9 × 0.25 × 0.02³ / 12 = 1666.7 N·m², so the sag is
 * P L³ / (48 E I) = 100 / (48 × 1666.7) = 1.25 mm (Roark's Formulas for Stress and Strain,
 * Table 8.1 case 1e, simply supported beam with a centre load; from memory).
 */
export const handShelf = {
	span: 1,
	depth: 0.25,
	thickness: 0.02,
	material: { name: 'Test board', modulus: 10e9, rupture: 40e6, density: 600 },
	support: 'simple',
	loads: [{ kind: 'point', force: 100, at: 0.5 }],
	selfWeight: false,
	duration: 'short',
	limit: 'L/144',
	options: { shearDeflection: false, safetyFactor: 3, curvePoints: 101 }
};
export const HAND_SAG_M = 0.00125;

/** The same shelf with a load that takes it past L/144: 700 N gives 8.75 mm > 1000/144 = 6.94 mm. */
export const failingShelf = { ...handShelf, loads: [{ kind: 'point', force: 700, at: 0.5 }] };

export async function saveShelf(
	actor: Actor,
	projectId: string,
	name = 'Hand-worked shelf',
	input: unknown = handShelf
) {
	return await createAnalysis(actor, projectId, { kind: 'shelf', name, input });
}
