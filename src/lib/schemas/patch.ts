import { z } from 'zod';

type Patch<T extends z.ZodRawShape> = z.ZodObject<{
	[K in keyof T]: z.ZodOptional<T[K] extends z.ZodDefault<infer Inner> ? Inner : T[K]>;
}>;

/**
 * The PATCH form of an object schema: every field optional and without its default, so a field
 * left out stays out (zod's `.partial()` keeps `.default('')`, which would wipe what is stored).
 */
export function patchOf<T extends z.ZodRawShape>(schema: z.ZodObject<T>): Patch<T> {
	const shape = Object.fromEntries(
		Object.entries(schema.shape).map(([key, field]) => [
			key,
			z.optional((field instanceof z.ZodDefault ? field.unwrap() : field) as z.ZodType)
		])
	);
	return z.object(shape) as unknown as Patch<T>;
}
