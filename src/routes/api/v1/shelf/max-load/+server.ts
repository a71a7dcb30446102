import { computeRoute } from '../compute';

/** POST /api/v1/shelf/max-load: the largest load of a given shape within the limit and strength. */
export const POST = computeRoute('/api/v1/shelf/max-load');
