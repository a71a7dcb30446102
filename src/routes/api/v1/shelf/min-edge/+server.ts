import { computeRoute } from '../compute';

/** POST /api/v1/shelf/min-edge: the smallest front (or back, or under) strip that meets the limit. */
export const POST = computeRoute('/api/v1/shelf/min-edge');
