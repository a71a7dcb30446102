export { planJointSI } from './plan';
export {
	screwWithdrawal,
	screwLateral,
	yieldLimitLb,
	dowelBearingPsi,
	resolveStock
} from './capacity';
export { spacedAlong } from './layout';
export { chooseBiscuit } from './biscuits';
export { pocketPlaces, pocketScrewLengthIn } from './screws';
export { JOINT_CAUTIONS } from './cautions';
export type * from './types';
