import type { ApiOperation } from './types';

export const shelfOperations: ApiOperation[] = [];
