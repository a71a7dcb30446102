import { analyzeInput } from '$lib/engine';
import { shelfRequestSchema } from '$lib/schemas/shelf';
import { computeRoute } from './compute';

/** POST /api/v1/shelf: sag, stress, creep and the checks of one shelf. */
export const POST = computeRoute(shelfRequestSchema, analyzeInput);
