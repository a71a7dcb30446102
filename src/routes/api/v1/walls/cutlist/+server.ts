import { computeRoute } from '../../shelf/compute';

/** POST /api/v1/walls/cutlist: the cut list, banding and hardware of a wall. Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/walls/cutlist');
