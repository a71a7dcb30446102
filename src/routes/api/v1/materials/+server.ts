import { json } from '@sveltejs/kit';
import { ENGINE_VERSION, materials } from '$lib/engine';

/** GET /api/v1/materials: the shelf material library with the source of every figure (SI units). */
export const GET = () => json({ engineVersion: ENGINE_VERSION, materials });
