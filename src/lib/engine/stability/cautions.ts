import { CPSC_TIPOVER_DEATHS } from '../../../../reference/tipping';

/** Shown with every stability result, whatever the numbers say. */
export const STABILITY_CAUTIONS = [
	'An estimate for planning by statics, not a test of the finished unit.',
	'Anchor every tall case to the wall whatever this number says: children climb open drawers and shelves.',
	`Tip-overs kill: the US CPSC counts ${CPSC_TIPOVER_DEATHS.deaths} deaths (${CPSC_TIPOVER_DEATHS.children} of them children) from ${CPSC_TIPOVER_DEATHS.period}; its advice is to anchor bookcases and dressers and store heavy items low.`,
	'Store heavy items on the lowest shelves.',
	'Follow local building codes and the advice of licensed professionals, above all in seismic regions.'
];
