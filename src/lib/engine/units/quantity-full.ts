/**
 * The full unit parser: any unit mathjs (the project's unit library) knows, for what the table in
 * unit-table.ts does not list. Importing this module registers it with quantity.ts. The server
 * imports it at start (hooks.server.ts); the browser never does, so mathjs stays out of its bundle.
 */
import { create, unitDependencies, type MathJsInstance, type Unit } from 'mathjs';
import { STANDARD_GRAVITY } from './si';
import { useFullUnitParser, type UnitTarget } from './quantity';

// Only the unit machinery: a small slice of mathjs, created on first use.
let math: MathJsInstance | undefined;
function mathUnit(text: string): Unit {
	math ??= create({ unitDependencies });
	return math.unit(text);
}

function tryUnit(text: string): Unit | undefined {
	try {
		return mathUnit(text);
	} catch {
		return undefined;
	}
}

/**
 * Read a normalised quantity text with mathjs, in the target's SI unit; a mass where a force-like
 * quantity is meant is its weight under standard gravity. Undefined when mathjs cannot read it or
 * it is another kind of quantity.
 */
export function parseWithMathjs(text: string, target: UnitTarget): number | undefined {
	const u = tryUnit(text);
	if (!u || u.value === null) return undefined;
	if (u.equalBase(mathUnit(target.si))) return u.toNumber(target.si);
	if (target.massBased && u.equalBase(mathUnit(target.massBased)))
		return u.toNumber(target.massBased) * STANDARD_GRAVITY;
	return undefined;
}

useFullUnitParser(parseWithMathjs);
