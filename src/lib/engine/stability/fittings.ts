/**
 * A unit's drawers, doors, base, floor and restraint as a design or a request gives them (weights
 * as forces in N, lengths in m), in the tip-over check's terms (masses in kg). The case check and
 * the tip-over request both read their fittings here.
 */
import { STANDARD_GRAVITY } from '../units/quantity';
import type { AnchorKind, StabilityRequest } from './types';

export interface Fittings {
	drawers?: { height: number; weight: number; contentsWeight?: number; extension?: number }[];
	doors?: { weight: number; width: number; centreHeight: number }[];
	base?: { setback?: number };
	floorTiltDeg?: number;
	anchoring?: { kind: AnchorKind; height?: number; intoStuds?: boolean };
	seismicRegion?: boolean;
}

type FittingsRequest = Required<
	Pick<StabilityRequest, 'base' | 'floorTiltDeg' | 'anchoring' | 'seismicRegion'>
> &
	Pick<StabilityRequest, 'drawers' | 'doors'>;

const kg = (n: number) => n / STANDARD_GRAVITY;

export function fittingsRequest(f: Fittings): FittingsRequest {
	return {
		drawers: f.drawers?.map((d) => ({
			heightM: d.height,
			massKg: kg(d.weight),
			contentsKg: d.contentsWeight === undefined ? undefined : kg(d.contentsWeight),
			extensionM: d.extension
		})),
		doors: f.doors?.map((d) => ({
			massKg: kg(d.weight),
			widthM: d.width,
			centreHeightM: d.centreHeight
		})),
		base: { setbackM: f.base?.setback ?? 0 },
		floorTiltDeg: f.floorTiltDeg ?? 0,
		anchoring: f.anchoring
			? { kind: f.anchoring.kind, heightM: f.anchoring.height, intoStuds: f.anchoring.intoStuds }
			: { kind: 'none' },
		seismicRegion: f.seismicRegion ?? false
	};
}
