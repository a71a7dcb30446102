/** Shown with every joint plan: these are planning estimates, not engineered ratings. */
export const JOINT_CAUTIONS = [
	'An estimate for planning from published formulas and tests, not a rated or tested capacity of your joint.',
	'Real joints vary with glue, fit, moisture, pilot holes and workmanship; test a sample joint when it matters.',
	'A failing shelf joint can drop heavy contents: keep a margin, and defer to local codes and licensed professionals for anything structural.'
];

/** Good practice shown with the plan (common practice, no source, unless cited). */
export const GOOD_PRACTICE = {
	biscuit:
		'Glue does most of the work in a biscuit joint: the biscuits align the parts and add glue area (Turk J Agric For 28(5), 2004: strength comes mainly from edge gluing).',
	mdfEdge:
		'Drill pilot holes in MDF and particleboard edges, 85–95% of the screw core diameter (mdf-info.eu), or the edge splits.',
	panelCorner:
		'Keep screws away from panel corners: face screws at least 25 mm and edge screws at least 70 mm from a corner (mdf-info.eu).',
	endGrain:
		'Screws into end grain hold poorly: the NDS allows no withdrawal from end grain (§12.2.1) and two thirds of the lateral value (§12.5.2).',
	pocket:
		'Clamp the parts flush while driving pocket screws; use coarse thread in softwood and panels, fine thread in hardwood.',
	partialFixity:
		'A glued or screwed shelf is only partly fixed: its joints rotate, so plan the sag as simply supported unless the joint is proven stiff.'
};
