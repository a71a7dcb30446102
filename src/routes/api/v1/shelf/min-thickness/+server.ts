import { computeRoute } from '../compute';

/** POST /api/v1/shelf/min-thickness: the thinnest stocked thickness that meets the limit. */
export const POST = computeRoute('/api/v1/shelf/min-thickness');
