import { computeRoute } from './compute';

/** POST /api/v1/shelf: sag, stress, creep and the checks of one shelf. */
export const POST = computeRoute('/api/v1/shelf');
