import { z } from 'zod';

// What the engine answers, in SI units (m, N, Pa, N·m). The objects are open: the engine may add a
// field without breaking a client; the fields listed here are always present.

const warning = z.looseObject({ code: z.string(), message: z.string() });

export const shelfAnalysisSchema = z
	.looseObject({
		engineVersion: z.string(),
		span: z.number().meta({ description: 'm' }),
		supports: z.array(z.number()),
		sag: z.looseObject({
			instant: z.number().meta({ description: 'm, as loaded' }),
			longTerm: z.number().meta({ description: 'm, after creep' }),
			at: z.number(),
			bending: z.number(),
			shear: z.number(),
			selfWeight: z.number(),
			checked: z.string(),
			creepFactor: z.number()
		}),
		limit: z.looseObject({
			name: z.string(),
			allowed: z.number(),
			pass: z.boolean(),
			margin: z.number(),
			source: z.string()
		}),
		ratio: z.number().nullable(),
		stress: z.number().meta({ description: 'Pa' }),
		strength: z.looseObject({
			rupture: z.number(),
			safetyFactor: z.number(),
			allowed: z.number(),
			utilisation: z.number(),
			pass: z.boolean(),
			governing: z.string()
		}),
		reactions: z.array(z.looseObject({ at: z.number(), force: z.number() })),
		curve: z.array(z.array(z.number())).meta({ description: '[x m, sag m] pairs' }),
		load: z.looseObject({ total: z.number(), selfWeight: z.number(), applied: z.number() }),
		material: z.looseObject({ id: z.string().optional(), name: z.string() }),
		warnings: z.array(warning)
	})
	.meta({ id: 'ShelfAnalysis' });

export const maxSpanResultSchema = z.looseObject({
	span: z.number(),
	spans: z.array(z.number()),
	capped: z.boolean(),
	analysis: shelfAnalysisSchema
});

export const minThicknessResultSchema = z.looseObject({
	thickness: z.number().nullable(),
	label: z.string().nullable(),
	exact: z.number().nullable(),
	tried: z.array(
		z.looseObject({ thickness: z.number(), label: z.string(), sag: z.number(), pass: z.boolean() })
	),
	analysis: shelfAnalysisSchema.nullable()
});

export const minEdgeResultSchema = z.looseObject({
	needed: z.boolean(),
	height: z.number().nullable(),
	heightRounded: z.number().nullable(),
	analysis: shelfAnalysisSchema.nullable()
});

export const maxLoadResultSchema = z.looseObject({
	magnitude: z.number(),
	total: z.number(),
	byDeflection: z.number(),
	byStrength: z.number(),
	governs: z.string(),
	analysis: shelfAnalysisSchema
});

export const materialListSchema = z.object({
	engineVersion: z.string(),
	materials: z.array(
		z.looseObject({
			id: z.string(),
			name: z.string(),
			kind: z.string(),
			modulusAlongPa: z.number(),
			modulusAcrossPa: z.number().nullable(),
			ruptureAlongPa: z.number(),
			ruptureAcrossPa: z.number().nullable(),
			densityKgM3: z.number(),
			thicknesses: z.array(z.looseObject({ label: z.string(), actualM: z.number() })),
			sources: z.record(z.string(), z.string())
		})
	)
});
