import { computeRoute } from '../../shelf/compute';

/** POST /api/v1/cases/check: check a whole case. Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/cases/check');
