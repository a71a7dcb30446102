import { computeRoute } from '../../shelf/compute';

/** POST /api/v1/walls/check: check a wall of cases. Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/walls/check');
