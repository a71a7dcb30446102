export { checkStabilitySI } from './check';
export { STABILITY_CAUTIONS } from './cautions';
export { restoringMoment, tipForceAtTop, tipAccelerationG } from './statics';
export type * from './types';
