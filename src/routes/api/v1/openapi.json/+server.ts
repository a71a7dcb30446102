import { json } from '@sveltejs/kit';
import { openApiDocument } from '$lib/server/openapi';
import { version } from '../../../../../package.json';

export const GET = () => json(openApiDocument(version));
