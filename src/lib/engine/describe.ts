/**
 * Plain sentences about a result, for the screen and the record: "This shelf sags about 3/32"…".
 */
import { formatLength, type LengthFormat } from './length';
import { formatForce, type ForceUnit } from './quantity';
import type { ShelfResult } from './types';

export interface DescribeFormat extends LengthFormat {
	force?: ForceUnit;
}

export function describeShelf(r: ShelfResult, format: DescribeFormat = {}): string[] {
	const len = (m: number) => formatLength(m, format);
	const out: string[] = [];
	const longTerm = r.sag.checked === 'longTerm' && r.sag.longTerm > r.sag.instant * 1.001;
	out.push(
		`This shelf sags about ${len(r.sag.instant)} when loaded` +
			(longTerm ? `, and about ${len(r.sag.longTerm)} after months under the load.` : '.')
	);
	out.push(
		r.limit.pass
			? `That is within ${r.limit.name} (${len(r.limit.allowed)} allowed), with ${Math.round(r.limit.margin * 100)}% to spare.`
			: `That is more than ${r.limit.name} allows (${len(r.limit.allowed)}): over by ${Math.round(-r.limit.margin * 100)}%.`
	);
	if (r.ratio !== null)
		out.push(`The span is about ${Math.round(r.ratio)} times the sag (L/${Math.round(r.ratio)}).`);
	out.push(
		`It carries ${formatForce(r.load.total, { unit: format.force })} in all, ${formatForce(r.load.selfWeight, { unit: format.force })} of it its own weight.`
	);
	out.push(
		r.strength.pass
			? `Bending stress is ${Math.round(r.strength.utilisation * 100)}% of what is allowed with a safety factor of ${r.strength.safetyFactor}.`
			: `Bending stress is ${r.strength.utilisation.toFixed(1)} times what is allowed with a safety factor of ${r.strength.safetyFactor}: it could break.`
	);
	out.push('These are estimates; real boards vary.');
	return out;
}
