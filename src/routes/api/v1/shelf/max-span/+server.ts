import { computeRoute } from '../compute';

/** POST /api/v1/shelf/max-span: the longest span that meets the limit. */
export const POST = computeRoute('/api/v1/shelf/max-span');
