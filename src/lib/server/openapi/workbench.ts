import type { ApiOperation } from './types';

export const workbenchOperations: ApiOperation[] = [];
