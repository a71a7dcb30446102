/** Every number anywhere in a result is finite (null is allowed: "no meaning here"). */
export function allFinite(value: unknown, path = 'result'): string[] {
	if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
	if (Array.isArray(value)) return value.flatMap((v, i) => allFinite(v, `${path}.${i}`));
	if (value && typeof value === 'object')
		return Object.entries(value).flatMap(([k, v]) => allFinite(v, `${path}.${k}`));
	return [];
}
