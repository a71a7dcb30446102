/**
 * The engine is the floor: it imports nothing outside src/lib/engine (and the cited figures in
 * reference/), and it runs under plain Node with tsx, no SvelteKit.
 */
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyzeShelf } from '../../src/lib/compute';

const ENGINE = resolve('src/lib/engine');
const REFERENCE = resolve('reference');

function files(dir: string): string[] {
	return readdirSync(dir).flatMap((name) => {
		const path = join(dir, name);
		return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
	});
}

describe('the engine', () => {
	it('imports only its own files, reference/ and plain packages: no schemas, zod, aliases or framework', () => {
		const outside: string[] = [];
		const framework = /^(\$|svelte|@sveltejs\/|zod|drizzle-orm|@auth\/)/;
		for (const file of files(ENGINE)) {
			const text = readFileSync(file, 'utf8');
			for (const m of text.matchAll(/(?:from|import)\s+'([^']+)'/g)) {
				const spec = m[1];
				if (!spec.startsWith('.')) {
					if (framework.test(spec)) outside.push(`${relative(ENGINE, file)}: ${spec}`);
					continue;
				}
				const target = resolve(dirname(file), spec);
				const inside =
					!relative(ENGINE, target).startsWith('..') ||
					!relative(REFERENCE, target).startsWith('..');
				if (!inside) outside.push(`${relative(ENGINE, file)}: ${spec}`);
			}
		}
		expect(outside).toEqual([]);
	});

	it('runs from plain tsx with typed SI input and agrees with parse-then-compute', () => {
		const out = execFileSync(
			resolve('node_modules/.bin/tsx'),
			[resolve('tests/engine/support/plain-run.ts')],
			{ encoding: 'utf8', timeout: 60_000 }
		);
		const plain = JSON.parse(out.trim().split('\n').pop()!);
		const parsed = analyzeShelf({
			span: 0.9144,
			depth: 0.2794,
			thickness: 0.01905,
			material: 'red-oak',
			loads: [{ kind: 'area', pressure: 1915.21 }]
		});
		expect(plain.sag).toBe(parsed.sag.longTerm);
		expect(plain.pass).toBe(parsed.limit.pass);
		expect(plain.biscuits).toBeGreaterThan(0);
		expect(typeof plain.tipsUnaided).toBe('boolean');
	});
});
