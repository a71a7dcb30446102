import { computeRoute } from '../shelf/compute';

/** POST /api/v1/joints: plan one joint. Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/joints');
