import type { ApiOperation } from './types';

export const joineryOperations: ApiOperation[] = [];
