import { maxSpanInput } from '$lib/engine';
import { maxSpanRequestSchema } from '$lib/schemas/shelf';
import { computeRoute } from '../compute';

/** POST /api/v1/shelf/max-span: the longest span that meets the limit. */
export const POST = computeRoute(maxSpanRequestSchema, maxSpanInput);
