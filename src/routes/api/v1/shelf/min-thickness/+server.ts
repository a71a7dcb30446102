import { minThicknessInput } from '$lib/engine';
import { minThicknessRequestSchema } from '$lib/schemas/shelf';
import { computeRoute } from '../compute';

/** POST /api/v1/shelf/min-thickness: the thinnest stocked thickness that meets the limit. */
export const POST = computeRoute(minThicknessRequestSchema, minThicknessInput);
