/**
 * The gzipped JavaScript a route loads on first visit, from the last `npx vite build`: SvelteKit's
 * entry/start and entry/app, the route's layout and page nodes, and every chunk they import
 * statically (dynamic imports load later, on demand, and are not counted). Run:
 *
 *   npx vite build && npx tsx tests/bench/route-size.ts ["(app)/projects/[id]/shelf/new"]
 *
 * Prints kB (1000 bytes, as Vite prints them) per chunk, gzipped at zlib's default level, and the
 * total (also in KiB). Exits 0; a benchmark reports, it never fails on a number.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

interface Chunk {
	file: string;
	src?: string;
	name?: string;
	isEntry?: boolean;
	imports?: string[];
}

const ROOT = process.cwd();
const CLIENT = join(ROOT, '.svelte-kit/output/client');
const NODES = '.svelte-kit/generated/client-optimized/nodes';
const route = (process.argv[2] ?? '(app)/projects/[id]/shelf/new').replace(/^\/|\/$/g, '');

const manifest = JSON.parse(readFileSync(join(CLIENT, '.vite/manifest.json'), 'utf8')) as Record<
	string,
	Chunk
>;

/** The route directory of a generated node (from the +layout/+page files it re-exports). */
function nodeFile(node: string): { dir: string; kind: 'layout' | 'page' } | null {
	const text = readFileSync(join(ROOT, NODES, node), 'utf8');
	const m = /src\/routes\/?(.*?)\/?\+(layout|page)(?:@[^.]*)?\.(?:svelte|ts|js)/.exec(text);
	return m ? { dir: m[1], kind: m[2] as 'layout' | 'page' } : null;
}

const segments = route.split('/');
const ancestors = new Set(segments.map((_, i) => segments.slice(0, i + 1).join('/')).concat(''));
// SvelteKit's two entries, found by their output names (their keys depend on where node_modules is)
const roots = Object.keys(manifest).filter(
	(key) => manifest[key].isEntry && /\/entry\/(?:start|app)\./.test(manifest[key].file)
);
let pageFound = false;
for (const node of readdirSync(join(ROOT, NODES)).sort()) {
	const found = nodeFile(node);
	const key = `${NODES}/${node}`;
	if (!found || !manifest[key]) continue;
	if (found.kind === 'layout' && ancestors.has(found.dir)) roots.push(key);
	if (found.kind === 'page' && found.dir === route) {
		roots.push(key);
		pageFound = true;
	}
}
if (!pageFound) {
	console.error(`No page node for route "${route}" in ${NODES}: run npx vite build first.`);
	process.exit(1);
}

const seen = new Set<string>();
function visit(key: string) {
	if (seen.has(key)) return;
	const chunk = manifest[key];
	if (!chunk) throw new Error(`manifest has no ${key}`);
	seen.add(key);
	for (const next of chunk.imports ?? []) visit(next);
}
for (const key of roots) visit(key);

const rows = [...seen]
	.map((key) => {
		const code = readFileSync(join(CLIENT, manifest[key].file));
		// a unit only the full parser (mathjs) defines, to say whether mathjs came along
		const mathjs = code.includes('kilogramforce');
		return { file: manifest[key].file, gz: gzipSync(code).length, raw: code.length, mathjs };
	})
	.sort((a, b) => b.gz - a.gz);

const kB = (bytes: number) => (bytes / 1000).toFixed(1).padStart(7);
console.log(`Route /${route}: ${rows.length} JS files loaded on first visit`);
console.log(`${'gzip kB'.padStart(7)} ${'raw kB'.padStart(7)}  file`);
for (const r of rows)
	console.log(`${kB(r.gz)} ${kB(r.raw)}  ${r.file}${r.mathjs ? '  (holds mathjs units)' : ''}`);
const total = rows.reduce((sum, r) => sum + r.gz, 0);
console.log(`${kB(total)} ${kB(rows.reduce((sum, r) => sum + r.raw, 0))}  total`);
console.log(`total gzipped: ${(total / 1000).toFixed(1)} kB = ${(total / 1024).toFixed(1)} KiB`);
console.log(`mathjs on this route: ${rows.some((r) => r.mathjs) ? 'yes' : 'no'}`);
