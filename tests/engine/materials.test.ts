import { describe, expect, it } from 'vitest';
import { findMaterial, materials } from '../../reference/materials';

const PSI = 6894.757293168;
const IN = 0.0254;

describe('material library', () => {
	it('holds every material the issue lists', () => {
		const ids = materials.map((m) => m.id);
		for (const id of [
			'mdo',
			'softwood-plywood',
			'hardwood-plywood-veneer-core',
			'hardwood-plywood-mdf-core',
			'birch-multiply',
			'mdf',
			'mdf-high-density',
			'particleboard-m2',
			'particleboard-m3',
			'melamine-particleboard',
			'red-oak',
			'white-oak',
			'hard-maple',
			'cherry',
			'walnut',
			'yellow-poplar',
			'ash',
			'birch',
			'douglas-fir',
			'eastern-white-pine'
		])
			expect(ids).toContain(id);
		expect(new Set(ids).size).toBe(ids.length);
	});
	it.each(materials.map((m) => [m.id, m] as const))(
		'%s: figures positive, each with a source',
		(_id, m) => {
			for (const v of [m.modulusAlongPa, m.ruptureAlongPa, m.densityKgM3, m.shearModulusPa])
				expect(v).toBeGreaterThan(0);
			expect(m.creep[0]).toBeGreaterThan(0);
			for (const s of Object.values(m.sources)) expect(s.length).toBeGreaterThan(10);
			expect(m.thicknesses.length).toBeGreaterThan(0);
			if (m.kind === 'solid') expect(m.modulusAcrossPa).toBeNull();
			else expect(m.modulusAcrossPa!).toBeLessThanOrEqual(m.modulusAlongPa);
		}
	);
	it('Wood Handbook Table 5-3a figures for northern red oak (12,500 MPa, 99,000 kPa)', () => {
		const oak = findMaterial('red-oak')!;
		expect(oak.modulusAlongPa).toBe(12500e6);
		expect(oak.ruptureAlongPa).toBe(99000e3);
	});
	it('softwood plywood 23/32": E·t³ gives back AWC Table M9.2-1 EI (440,000 and 91,500 lb·in²/ft)', () => {
		const ply = findMaterial('softwood-plywood')!;
		const t = ply.thicknesses.find((x) => x.label.includes('23/32'))!;
		const tIn = t.actualM / IN;
		expect(((t.modulusAlongPa! / PSI) * 12 * tIn ** 3) / 12).toBeCloseTo(440000, 3);
		expect(((t.modulusAcrossPa! / PSI) * 12 * tIn ** 3) / 12).toBeCloseTo(91500, 3);
	});
	it('Eurocode 5 Table 3.2 k_def: solid timber 0.6/0.8/2.0, MDF.LA 2.25 dry only', () => {
		expect(findMaterial('cherry')!.creep).toEqual([0.6, 0.8, 2.0]);
		expect(findMaterial('mdf')!.creep).toEqual([2.25, null, null]);
	});
	it('AWS §4.4.14.10.12 hardwood-veneered plywood, 1,800,000 psi', () => {
		expect(findMaterial('hardwood-plywood-veneer-core')!.modulusAlongPa / PSI).toBeCloseTo(
			1.8e6,
			3
		);
	});
});
