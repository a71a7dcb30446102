/**
 * The length of each joint along its meeting line and what its two ends are, for the joint
 * drawings: a shelf, top or bottom meets the side along its depth (front to back); a rail meets
 * a stile across the rail's width; the frame meets each case side along its height.
 */
import type { CaseDesign } from '../schemas/case';
import { caseGeometry } from '../engine/case/geometry';
import type { CaseJoint, CaseResult } from '../engine/case/types';

export interface JointRun {
	lengthM: number;
	ends: [string, string];
	/** what piece's edge is drawn */
	piece: string;
}

export function jointRun(joint: CaseJoint, d: CaseDesign, r: CaseResult): JointRun {
	if (joint.id === 'rail-to-stile')
		return { lengthM: d.faceFrame?.railWidth ?? 0, ends: ['edge', 'edge'], piece: 'rail end' };
	if (joint.id === 'frame-to-case')
		return { lengthM: d.height, ends: ['one end', 'other end'], piece: 'stile' };
	const at = joint.path.join('.');
	const shelf = r.shelves.find((s) => s.path.join('.') === at);
	const depth = shelf?.depthM ?? caseGeometry(d).insideDepthM;
	return { lengthM: depth, ends: ['front', 'back'], piece: 'panel end' };
}
