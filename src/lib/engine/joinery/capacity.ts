import {
	DOWEL_BEARING_COEFF_PSI,
	DOWEL_BEARING_EXPONENT,
	LOAD_DURATION_PERMANENT,
	NDS_WOOD_SCREW_WITHDRAWAL_COEFF,
	PANEL_EDGE_TO_FACE_WITHDRAWAL,
	ULTIMATE_TO_ALLOWABLE,
	WOOD_HANDBOOK_SCREW_WITHDRAWAL_ULTIMATE_COEFF,
	reductionTermRd
} from '../../../../reference/fasteners';
import {
	PANEL_TEST_PENETRATION_IN,
	PANEL_TEST_SCREW_DIAMETER_IN,
	findStockHolding,
	type StockKind
} from '../../../../reference/stock-holding';
import type { StockMaterial } from './types';
import { N_PER_LBF, inches } from './units';
import { InputError } from '../errors';
import { positive } from './validate';

export interface ResolvedStock {
	name: string;
	kind: StockKind;
	specificGravity: number;
	isPanel: boolean;
	screwHoldingFaceN?: number;
	screwHoldingEdgeN?: number;
	compressionPerpPa?: number;
	compressionPerpSource?: string;
	source: string;
}

export function resolveStock(material: StockMaterial, field: string): ResolvedStock {
	if (typeof material === 'string') {
		const s = findStockHolding(material);
		if (!s) throw InputError.at(field, `unknown stock "${material}"`);
		return {
			name: s.name,
			kind: s.kind,
			specificGravity: s.specificGravity,
			isPanel: isPanelKind(s.kind),
			screwHoldingFaceN: s.screwHoldingFaceN,
			screwHoldingEdgeN: s.screwHoldingEdgeN,
			compressionPerpPa: s.compressionPerpPa,
			compressionPerpSource: s.compressionPerpSource,
			source: s.screwHoldingSource ?? s.specificGravitySource
		};
	}
	const g = positive(material.specificGravity, `${field}.specificGravity`);
	if (g > 1.5)
		throw InputError.at(`${field}.specificGravity`, 'expected a specific gravity below 1.5');
	return {
		name: material.name ?? `custom ${material.kind}`,
		kind: material.kind,
		specificGravity: g,
		isPanel: isPanelKind(material.kind),
		source: 'specific gravity given by the caller'
	};
}

const isPanelKind = (k: StockKind) => k === 'plywood' || k === 'mdf' || k === 'particleboard';
/** Particleboard and MDF hold screws by their own standard's figures; plywood by the NDS as wood. */
const isFibrePanel = (s: ResolvedStock) => s.kind === 'mdf' || s.kind === 'particleboard';

export type Grain = 'side' | 'end' | 'panel-face' | 'panel-edge';

interface Withdrawal {
	designN: number;
	ultimateN: number;
	basis: string;
}

/**
 * Withdrawal of one wood screw of shank diameter `diameterM` with `penetrationM` of thread in `stock`.
 * Solid wood and plywood: NDS 2018 Eq. 12.2-2, W = 2850·G²·D per inch of thread, × C_D 0.9 for
 * permanent load (NDS Table 2.3.2), ultimate by the Wood Handbook's 15,700·G²·D·L. End grain: none
 * (NDS §12.2.1). Particleboard and MDF: the panel standard's screw-holding scaled by diameter and
 * penetration from the ASTM D1037 test screw (an assumption of this tool), the edge at most the
 * standard's edge figure; brought to allowable by the handbook-to-NDS ratio 2850/15700.
 */
export function screwWithdrawal(
	stock: ResolvedStock,
	grain: Grain,
	diameterM: number,
	penetrationM: number
): Withdrawal {
	const d = inches(diameterM);
	const p = Math.max(0, inches(penetrationM));
	if (grain === 'end')
		return { designN: 0, ultimateN: 0, basis: 'no withdrawal from end grain (NDS 2018 §12.2.1)' };
	if (isFibrePanel(stock)) {
		const scale = (d / PANEL_TEST_SCREW_DIAMETER_IN) * (p / PANEL_TEST_PENETRATION_IN);
		const face = stock.screwHoldingFaceN ?? faceFromGravity(stock.specificGravity);
		const perTest =
			grain === 'panel-edge'
				? (stock.screwHoldingEdgeN ?? face * PANEL_EDGE_TO_FACE_WITHDRAWAL)
				: face;
		const ultimateN = perTest * scale;
		return {
			designN: ultimateN * ULTIMATE_TO_ALLOWABLE * LOAD_DURATION_PERMANENT,
			ultimateN,
			basis: `${stock.source}, scaled from the ASTM D1037 test screw; allowable = ultimate × 2850/15700 × C_D 0.9`
		};
	}
	const g2 = stock.specificGravity ** 2;
	// plywood edges hold like panel edges (McNatt: edge 75–80% of face)
	const edge = grain === 'panel-edge' ? PANEL_EDGE_TO_FACE_WITHDRAWAL : 1;
	const designLb = NDS_WOOD_SCREW_WITHDRAWAL_COEFF * g2 * d * p * LOAD_DURATION_PERMANENT * edge;
	const ultimateLb = WOOD_HANDBOOK_SCREW_WITHDRAWAL_ULTIMATE_COEFF * g2 * d * p * edge;
	return {
		designN: designLb * N_PER_LBF,
		ultimateN: ultimateLb * N_PER_LBF,
		basis:
			'NDS 2018 Eq. 12.2-2 W = 2850·G²·D·p × C_D 0.9; ultimate Wood Handbook 15,700·G²·D·L' +
			(edge < 1 ? '; panel edge × 0.75 (McNatt)' : '')
	};
}

function faceFromGravity(g: number): number {
	const lb =
		WOOD_HANDBOOK_SCREW_WITHDRAWAL_ULTIMATE_COEFF *
		g *
		g *
		PANEL_TEST_SCREW_DIAMETER_IN *
		PANEL_TEST_PENETRATION_IN;
	return lb * N_PER_LBF;
}

/** Dowel bearing strength for D < 1/4", NDS 2018 Table 12.3.3 footnote: Fe = 16,600·G^1.84 psi. */
export function dowelBearingPsi(g: number): number {
	return DOWEL_BEARING_COEFF_PSI * g ** DOWEL_BEARING_EXPONENT;
}

interface LateralInput {
	diameterIn: number;
	/** side member bearing length, in */
	lsIn: number;
	/** main member penetration, in */
	lmIn: number;
	fesPsi: number;
	femPsi: number;
	fybPsi: number;
}

/**
 * Single-shear yield limit equations of NDS 2018 Table 12.3.1A (modes Im, Is, II, IIIm, IIIs, IV),
 * returning the least, in lb, with the reduction term Rd of Table 12.3.1B.
 */
export function yieldLimitLb(i: LateralInput): { zLb: number; mode: string; rd: number } {
	const { diameterIn: D, lsIn: ls, lmIn: lm, fesPsi: Fes, femPsi: Fem, fybPsi: Fyb } = i;
	const rd = reductionTermRd(D);
	if (ls <= 0 || lm <= 0) return { zLb: 0, mode: 'none', rd };
	const Re = Fem / Fes;
	const Rt = lm / ls;
	const k1 =
		(Math.sqrt(Re + 2 * Re ** 2 * (1 + Rt + Rt ** 2) + Rt ** 2 * Re ** 3) - Re * (1 + Rt)) /
		(1 + Re);
	const k2 = -1 + Math.sqrt(2 * (1 + Re) + (2 * Fyb * (1 + 2 * Re) * D ** 2) / (3 * Fem * lm ** 2));
	const k3 =
		-1 + Math.sqrt((2 * (1 + Re)) / Re + (2 * Fyb * (2 + Re) * D ** 2) / (3 * Fem * ls ** 2));
	const modes: [string, number][] = [
		['Im', (D * lm * Fem) / rd],
		['Is', (D * ls * Fes) / rd],
		['II', (k1 * D * ls * Fes) / rd],
		['IIIm', (k2 * D * lm * Fem) / ((1 + 2 * Re) * rd)],
		['IIIs', (k3 * D * ls * Fem) / ((2 + Re) * rd)],
		['IV', (D ** 2 / rd) * Math.sqrt((2 * Fem * Fyb) / (3 * (1 + Re)))]
	];
	let best = modes[0];
	for (const m of modes) if (m[1] < best[1]) best = m;
	return { zLb: best[1], mode: best[0], rd };
}

interface Lateral {
	designN: number;
	/** 5% offset yield: the yield limit without the reduction term Rd */
	yieldN: number;
	basis: string;
}

/** Lateral capacity of one screw: NDS yield limit × C_D 0.9, × C_eg 0.67 into end grain (§12.5.2). */
export function screwLateral(
	side: ResolvedStock,
	main: ResolvedStock,
	diameterM: number,
	lsM: number,
	lmM: number,
	fybPsi: number,
	endGrainFactor: number
): Lateral {
	const z = yieldLimitLb({
		diameterIn: inches(diameterM),
		lsIn: inches(lsM),
		lmIn: inches(lmM),
		fesPsi: dowelBearingPsi(side.specificGravity),
		femPsi: dowelBearingPsi(main.specificGravity),
		fybPsi
	});
	const designN = z.zLb * N_PER_LBF * LOAD_DURATION_PERMANENT * endGrainFactor;
	return {
		designN,
		yieldN: z.zLb * z.rd * N_PER_LBF * endGrainFactor,
		basis: `NDS 2018 Table 12.3.1A yield limit (mode ${z.mode}, Rd ${z.rd.toFixed(2)}) × C_D 0.9${endGrainFactor < 1 ? ' × C_eg 0.67' : ''}`
	};
}
