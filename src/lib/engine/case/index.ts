export { checkCaseSI } from './check';
export { caseGeometry, partsList } from './geometry';
export type * from './types';
