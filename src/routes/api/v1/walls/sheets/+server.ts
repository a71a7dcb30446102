import { computeRoute } from '../../shelf/compute';

/** POST /api/v1/walls/sheets: sheet layouts of a wall's cut list (the body's `sheets` sets kerf, trim
 * and stock). Open to anyone, nothing stored. */
export const POST = computeRoute('/api/v1/walls/sheets');
