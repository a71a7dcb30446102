import { z } from 'zod';

// Results of the wall engine (SI units). Open objects: the fields listed are always present.

const cutList = z.looseObject({
	groups: z.array(z.looseObject({})),
	marks: z.array(z.string()),
	roughAllowanceM: z.number()
});

export const wallCheckSchema = z
	.looseObject({
		estimate: z.literal(true),
		engineVersion: z.string(),
		name: z.string().nullable(),
		pass: z.boolean(),
		widthM: z.number(),
		cases: z.array(z.looseObject({})),
		margins: z.array(z.looseObject({})),
		suggestions: z.array(z.looseObject({})),
		summary: z.looseObject({ failures: z.number().int(), worst: z.array(z.looseObject({})) }),
		parts: z.array(z.looseObject({})),
		warnings: z.array(z.string()),
		cautions: z.array(z.string())
	})
	.meta({ id: 'WallCheck' });

export const wallCutListSchema = z.looseObject({
	estimate: z.literal(true),
	cutList,
	banding: z.array(z.looseObject({})),
	hardware: z.array(z.looseObject({}))
});

export const wallSheetsSchema = z.looseObject({
	cutList,
	sheets: z.looseObject({
		sheets: z.array(z.looseObject({})),
		perMaterial: z.array(z.looseObject({})),
		notOnSheets: z.array(z.looseObject({}))
	})
});
