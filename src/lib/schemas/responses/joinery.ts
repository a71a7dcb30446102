import { z } from 'zod';
import { shelfAnalysisSchema } from './shelf';

// Results of the joint, tip-over and whole-case engines, in SI units. Open objects: the fields
// listed are always present; the engine may add more.

export const jointPlanSchema = z
	.looseObject({
		estimate: z.literal(true),
		kind: z.string(),
		fastener: z.string(),
		description: z.string(),
		count: z.number().int(),
		positions: z.array(z.looseObject({ alongM: z.number(), acrossM: z.number() })),
		checks: z.array(
			z.looseObject({
				what: z.string(),
				demand: z.number(),
				design: z.number(),
				utilisation: z.number(),
				pass: z.boolean()
			})
		),
		demand: z.looseObject({ shearN: z.number() }),
		utilisation: z.number(),
		pass: z.boolean(),
		cautions: z.array(z.string()),
		sources: z.array(z.string())
	})
	.meta({ id: 'JointPlan' });

const byLoading = z.looseObject({ empty: z.number(), loaded: z.number() });

export const stabilityResultSchema = z
	.looseObject({
		estimate: z.literal(true),
		centreOfGravity: z.looseObject({
			empty: z.looseObject({ massKg: z.number(), fromFrontM: z.number(), heightM: z.number() }),
			loaded: z.looseObject({ massKg: z.number(), fromFrontM: z.number(), heightM: z.number() })
		}),
		tipForceAtTopN: byLoading,
		tipsUnaided: z.boolean(),
		standards: z.array(z.looseObject({ name: z.string(), applies: z.boolean() })),
		anchoring: z.looseObject({ required: z.boolean(), recommendations: z.array(z.string()) }),
		warnings: z.array(z.string()),
		cautions: z.array(z.string()),
		sources: z.array(z.string())
	})
	.meta({ id: 'StabilityResult' });

export const caseCheckSchema = z
	.looseObject({
		estimate: z.literal(true),
		engineVersion: z.string(),
		name: z.string().nullable(),
		pass: z.boolean(),
		summary: z.looseObject({
			failures: z.number().int(),
			worst: z.array(z.looseObject({ key: z.string(), what: z.string(), pass: z.boolean() }))
		}),
		shelves: z.array(
			z.looseObject({
				name: z.string(),
				kind: z.string(),
				spanM: z.number(),
				analysis: shelfAnalysisSchema
			})
		)
	})
	.meta({ id: 'CaseCheck' });
