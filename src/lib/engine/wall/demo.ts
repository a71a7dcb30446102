/**
 * A scenario of our own (invented numbers, no source): two tall bookcases about 80" × 17" deep and
 * two 30" low units with two drawers each, side by side, painted MDO with 1/4" plywood backs in a
 * rabbet, biscuits and pocket screws. Used by the tests, the bench and the demo data.
 */
import type { DrawerOpeningDesign, WallCaseDesign, WallDesign } from './types';
import { METRES_PER_INCH } from '../units/length';

const IN = METRES_PER_INCH;
const PSF = 47.88025898033584; // N/m² per lbf/ft² (lbf and ft exact)
const books = [{ kind: 'area' as const, pressure: 40 * PSF }];

function tall(name: string): WallCaseDesign {
	const heights = [12.5, 24, 36, 48, 60];
	return {
		name,
		width: 30 * IN,
		height: 80 * IN,
		depth: 17 * IN,
		sides: { material: 'mdo', thickness: (23 / 32) * IN },
		top: { joint: 'biscuit', loads: [] },
		bottom: { joint: 'biscuit', loads: [] },
		back: { material: 'softwood-plywood', thickness: 0.25 * IN, fitted: 'rabbet' },
		shelves: heights.map((h, i) => ({
			height: h * IN,
			kind: i === 2 ? ('fixed' as const) : ('adjustable' as const),
			joint: i === 2 ? ('pocket-screw' as const) : ('biscuit' as const),
			ends: 'simple' as const,
			loads: books,
			itemHeight: 10 * IN
		})),
		dividers: [],
		drawers: [],
		doors: [],
		base: { height: 3.5 * IN, setback: 3 * IN, kind: 'plinth' },
		limit: 'L/144',
		service: 'dry'
	};
}

function drawers(bottom: number): DrawerOpeningDesign {
	return {
		bottom,
		heights: [11 * IN, 11 * IN],
		box: {
			material: 'birch-multiply',
			thickness: 0.5 * IN,
			bottom: { material: 'birch-multiply', thickness: 0.25 * IN },
			grooveDepth: 0.25 * IN,
			corners: 'butt',
			heightClearance: 1 * IN
		},
		slide: { sideClearance: 0.5 * IN, length: 14 * IN, extension: 'full' },
		front: {
			material: 'mdo',
			thickness: 0.75 * IN,
			mount: 'overlay',
			overlay: 0.375 * IN,
			gap: 0.125 * IN
		},
		contentsWeight: 0
	};
}

function low(name: string): WallCaseDesign {
	return {
		name,
		width: 30 * IN,
		height: 30 * IN,
		depth: 17 * IN,
		sides: { material: 'mdo', thickness: (23 / 32) * IN },
		top: { joint: 'pocket-screw', loads: [] },
		bottom: { joint: 'biscuit', loads: [] },
		back: { material: 'softwood-plywood', thickness: 0.25 * IN, fitted: 'rabbet' },
		shelves: [],
		dividers: [],
		drawers: [drawers(4.25 * IN)],
		doors: [],
		base: { height: 3.5 * IN, setback: 3 * IN, kind: 'plinth' },
		limit: 'L/144',
		service: 'dry'
	};
}

export const DEMO_WALL: WallDesign = {
	name: 'Living-room wall (demo)',
	cases: [
		tall('tall bookcase, left'),
		low('low unit, left'),
		low('low unit, right'),
		tall('tall bookcase, right')
	],
	sharedFaceFrame: false,
	sharedToeKick: false,
	roughAllowance: 0.125 * IN,
	bandingWaste: 0.1
};
