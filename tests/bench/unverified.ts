/**
 * How many published figures still rest on memory rather than on a copy of their source.
 *
 *   npx tsx tests/bench/unverified.ts [--list]
 *
 * Counts, in reference/ and in the engine, every line that marks a figure "from memory" (recalled,
 * no stored copy of the source confirmed it) or "unverified" (read in a secondary summary only);
 * and, among the source texts the app shows or returns from reference/ (material, load-preset and
 * stock-holding sources; the engine's own source texts are among the marked lines), those that
 * carry either mark. --list prints each one.
 * Exits 0: it reports; bringing the number down is done by reading sources, not by editing words.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { materials } from '../../reference/materials';
import { loadPresets } from '../../reference/load-presets';
import { STOCK_HOLDING } from '../../reference/stock-holding';

const ROOT = process.cwd();
const MARK = /from memory|unverified/i;
const list = process.argv.includes('--list');

function files(dir: string): string[] {
	return readdirSync(dir).flatMap((name) => {
		const path = join(dir, name);
		if (statSync(path).isDirectory()) return files(path);
		return /\.ts$/.test(name) ? [path] : [];
	});
}

const marked = [...files(join(ROOT, 'reference')), ...files(join(ROOT, 'src/lib/engine'))].flatMap(
	(path) =>
		readFileSync(path, 'utf8')
			.split('\n')
			.map((line, i) => ({ at: `${relative(ROOT, path)}:${i + 1}`, line: line.trim() }))
			.filter((l) => MARK.test(l.line))
);

const shown: { what: string; text: string }[] = [
	...materials.flatMap((m) =>
		Object.entries(m.sources).map(([k, text]) => ({ what: `material ${m.id} ${k}`, text }))
	),
	...loadPresets.map((p) => ({ what: `load preset ${p.id}`, text: p.source })),
	...STOCK_HOLDING.flatMap((s) => [
		{ what: `stock ${s.id} specific gravity`, text: s.specificGravitySource },
		...(s.screwHoldingSource
			? [{ what: `stock ${s.id} screw holding`, text: s.screwHoldingSource }]
			: [])
	])
].filter((s) => MARK.test(s.text));

const byFile = new Map<string, number>();
for (const m of marked) {
	const file = m.at.replace(/:\d+$/, '');
	byFile.set(file, (byFile.get(file) ?? 0) + 1);
}

console.log(`unverified figures: ${marked.length} marked lines in reference/ and the engine`);
for (const [file, n] of [...byFile].sort((a, b) => b[1] - a[1])) console.log(`  ${n}\t${file}`);
console.log(`unverified sources shown or returned by the app: ${shown.length}`);
if (list) {
	console.log('\nmarked lines:');
	for (const m of marked) console.log(`  ${m.at}  ${m.line}`);
	console.log('\nsources shown:');
	for (const s of shown) console.log(`  ${s.what}: ${s.text}`);
}
