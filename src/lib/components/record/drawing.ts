/**
 * The measured drawing of a saved shelf, from its stored SI input and the engine's result: the
 * record draws what was checked, not a draft being typed.
 */
import type { ShelfResult } from '../../engine/shelf/types';
import type { ShelfInput } from '../../schemas/shelf';
import type { DrawingLoad, ShelfDrawingInput } from '../shelf-drawing/geometry';

export function savedShelfDrawing(input: ShelfInput, r: ShelfResult): ShelfDrawingInput {
	const loads: DrawingLoad[] = input.loads.map((l) =>
		l.kind === 'point'
			? { kind: 'point', atM: Math.min(r.span, l.at), label: 'load' }
			: {
					kind: l.kind === 'area' ? 'area' : 'line',
					fromM: l.kind === 'line' ? (l.from ?? 0) : 0,
					toM: l.kind === 'line' ? (l.to ?? r.span) : r.span,
					label: 'load'
				}
	);
	const strips = input.edges
		.filter((e) => e.side !== 'back')
		.map((e) => ({ side: e.side as 'front' | 'below', heightM: e.height }));
	return {
		spanM: r.span,
		thicknessM: input.thickness,
		support: typeof input.support === 'string' ? input.support : 'continuous',
		supportsM: r.supports,
		dividerM: typeof input.support === 'string' ? 0 : (input.support.divider ?? 0),
		loads,
		strips,
		curve: r.curve,
		sagAtM: r.sag.at,
		sagM: r.sag[r.sag.checked],
		allowedM: r.limit.allowed
	};
}
