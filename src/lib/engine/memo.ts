/**
 * A map keyed by the content of plain data (objects, arrays, strings, numbers, booleans, null):
 * two keys that JSON.stringify would write the same find the same entry. The key is read as a run
 * of tokens (markers for the start and end of each object and array, property names, primitive
 * values) down a tree of Maps, so no number is ever turned into text: writing a double in its
 * shortest form is what made a JSON.stringify key cost microseconds (issue 12).
 *
 * Like JSON.stringify it skips properties whose value is undefined (and writes an undefined array
 * element as null). It is stricter in one way only: NaN, Infinity and -Infinity are told apart
 * (JSON writes each as null), which can cost a cache hit, never give a wrong one.
 */
const OPEN_OBJECT = Symbol('{');
const OPEN_ARRAY = Symbol('[');
const CLOSE = Symbol('}');
const VALUE = Symbol('value');

type Node = Map<unknown, Node> & { [VALUE]?: unknown };

export class ContentMap<V> {
	private root: Node = new Map();
	private scratch: unknown[] = [];

	get(key: unknown): V | undefined {
		const node = this.find(key, false);
		return node ? (node[VALUE] as V | undefined) : undefined;
	}

	set(key: unknown, value: V): this {
		this.find(key, true)![VALUE] = value;
		return this;
	}

	private find(key: unknown, create: boolean): Node | undefined {
		const tokens = this.scratch;
		tokens.length = 0;
		tokenize(key, tokens);
		let node = this.root;
		for (let i = 0; i < tokens.length; i++) {
			let next = node.get(tokens[i]);
			if (!next) {
				if (!create) return undefined;
				next = new Map() as Node;
				node.set(tokens[i], next);
			}
			node = next;
		}
		return node;
	}
}

function tokenize(v: unknown, out: unknown[]): void {
	if (v === null || typeof v !== 'object') {
		out.push(v === undefined ? null : v);
		return;
	}
	if (Array.isArray(v)) {
		out.push(OPEN_ARRAY);
		for (let i = 0; i < v.length; i++) tokenize(v[i], out);
		out.push(CLOSE);
		return;
	}
	out.push(OPEN_OBJECT);
	for (const k in v) {
		if (!Object.prototype.hasOwnProperty.call(v, k)) continue;
		const x = (v as Record<string, unknown>)[k];
		if (x === undefined || typeof x === 'function') continue;
		out.push(k);
		tokenize(x, out);
	}
	out.push(CLOSE);
}
