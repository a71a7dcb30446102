import type { ApiOperation } from './types';

export const foundationOperations: ApiOperation[] = [];
