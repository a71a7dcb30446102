import { computeRoute } from '../shelf/compute';

/** POST /api/v1/stability: tip-over and anchoring of one case. Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/stability');
