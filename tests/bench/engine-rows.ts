/**
 * The engine rows of issue 12, each beside its goal and beside plain closed-form loops written
 * with multiplications, timed in the same run (the ratio is the figure that travels between
 * machines; the microseconds hang on the machine and on what else it is doing).
 *
 *   npm run bench   (or: bash tests/bench/engine-rows.sh)
 *
 * It is bundled first (esbuild, as the app's own build does), so calls between the engine's
 * modules are plain calls, not a test loader's module lookups. Medians of seven runs of a batch, in
 * CPU time (the wall clock of a busy machine counts the waits for a core too).
 * Reports only: nothing here fails on a slow number.
 */
import { loadavg } from 'node:os';
import {
	DEFAULT_SHELF_OPTIONS,
	analyzeInput,
	checkCaseSI,
	maxLoadInput,
	maxSpanInput,
	minEdgeInput,
	minThicknessInput,
	type ShelfInput
} from '../../src/lib/engine';
import { caseDesigns } from '../engine/support/solver-cases';

/** The bench's shelf: 36" of 3/4" red oak, 11" deep, 40 lbf/ft² of books (SI). */
const shelf: ShelfInput = {
	span: 0.9144,
	depth: 0.2794,
	thickness: 0.01905,
	material: 'red-oak',
	grain: 'along',
	support: 'simple',
	loads: [{ kind: 'area', pressure: 1915.21 }],
	selfWeight: true,
	edges: [],
	duration: 'long',
	service: 'dry',
	limit: 'L/144',
	options: DEFAULT_SHELF_OPTIONS
};
const [libraryCase] = caseDesigns(); // 36" × 96", 12 shelves at 40 lbf/ft², as tests/bench/case.bench.ts

let sink = 0;
const E = 12.5e9;
const B = shelf.depth;
const T = shelf.thickness;
const EI = (E * B * T * T * T) / 12;
const W = 1915.21 * B;

/** A 101-point curve of a simply supported uniform load: w·x(L³ − 2Lx² + x³)/24EI. */
function plainCurve() {
	const L = 0.9144 + sink * 1e-30;
	const L3 = L * L * L;
	let s = 0;
	for (let i = 0; i <= 100; i++) {
		const x = (L * i) / 100;
		s += (W * x * (L3 - 2 * L * x * x + x * x * x)) / (24 * EI);
	}
	sink += s;
}

/** Twelve simply supported sags 5wL⁴/384EI, as a hand check of the case's shelves. */
function plainTwelve() {
	for (let i = 0; i < 12; i++) {
		const w = W + i + sink * 1e-30;
		const l = 0.8763;
		sink += (5 * w * l * l * l * l) / (384 * EI);
	}
}

/** CPU time of this process so far, ms: on a shared machine the wall clock also counts the time
 * spent waiting for a core, which is not the engine's. */
function cpu(): number {
	const { user, system } = process.cpuUsage();
	return (user + system) / 1000;
}

/**
 * CPU time of one call, µs: `cold`, the mean over the first 200 ms of calls (what a process that
 * just started pays, the compiler still at work); `warm`, the median of seven runs of a batch
 * sized to take about 30 ms, after at least 5,000 calls and 200 ms (the case check takes some
 * thousands of calls to reach its steady speed: 200 ms alone measured mostly its warm-up).
 */
function time(fn: () => void): { warm: number; cold: number } {
	let t0 = cpu();
	let calls = 0;
	while (cpu() - t0 < 200) {
		fn();
		calls++;
	}
	const cold = ((cpu() - t0) / calls) * 1000;
	for (; calls < 5000; calls++) fn();
	t0 = cpu();
	let n = 0;
	while (cpu() - t0 < 30) {
		fn();
		n++;
	}
	const runs: number[] = [];
	for (let r = 0; r < 7; r++) {
		const t = cpu();
		for (let i = 0; i < n; i++) fn();
		runs.push(((cpu() - t) / n) * 1000);
	}
	return { warm: runs.sort((a, b) => a - b)[3], cold };
}

const rows: {
	what: string;
	run: () => void;
	goal: string;
	check: (us: number, plain: number) => boolean;
	plain: () => void;
}[] = [
	{
		what: 'maxSpan',
		run: () => void (sink += maxSpanInput({ ...shelf, span: undefined }).span),
		goal: '< 100 µs',
		check: (us) => us < 100,
		plain: plainCurve
	},
	{
		what: 'minThickness',
		run: () => void (sink += minThicknessInput(shelf).exact ?? 0),
		goal: '< 100 µs',
		check: (us) => us < 100,
		plain: plainCurve
	},
	{
		what: 'minEdge (36" → 48" of MDF)',
		run: () =>
			void (sink +=
				minEdgeInput({
					...shelf,
					span: 1.2192,
					material: 'mdf',
					strip: { side: 'front', material: 'red-oak', thickness: 0.01905 }
				}).height ?? 0),
		goal: '< 100 µs',
		check: (us) => us < 100,
		plain: plainCurve
	},
	{
		what: 'maxLoad (area)',
		run: () =>
			void (sink += maxLoadInput({ ...shelf, loads: [], load: { kind: 'area' } }).magnitude),
		goal: '< 100 µs',
		check: (us) => us < 100,
		plain: plainCurve
	},
	{
		what: 'analyzeShelf (validated input, 101-point curve)',
		run: () => void (sink += analyzeInput(shelf).curve[50][1]),
		goal: '≤ 10× plain',
		check: (us, plain) => us <= 10 * plain,
		plain: plainCurve
	},
	{
		what: 'checkCase, 12 shelves',
		run: () => void (sink += checkCaseSI(libraryCase).margins.length),
		goal: '< 500 µs',
		check: (us) => us < 500,
		plain: plainTwelve
	}
];

const [load] = loadavg();
console.log(
	`\nengine rows (issue 12): load average ${load.toFixed(1)} on this machine; CPU time after 5,000 warm-up calls, medians of 7 runs\n`
);
console.log(
	[
		'what'.padEnd(48),
		'µs'.padStart(9),
		'goal'.padStart(12),
		'plain µs'.padStart(10),
		'ratio'.padStart(8),
		'  meets',
		'cold µs'.padStart(10)
	].join('')
);
const only = process.argv[2];
for (const row of rows.filter((r) => !only || r.what.startsWith(only))) {
	const { warm: us, cold } = time(row.run);
	const plain = time(row.plain).warm;
	console.log(
		[
			row.what.padEnd(48),
			us.toFixed(1).padStart(9),
			row.goal.padStart(12),
			plain.toFixed(2).padStart(10),
			`${(us / plain).toFixed(0)}×`.padStart(8),
			row.check(us, plain) ? '  yes' : '   no',
			cold.toFixed(1).padStart(10)
		].join('')
	);
}
console.log(
	'\nplain: a 101-point closed-form curve loop (solver and analysis rows) or 12 closed-form sags (case row), in multiplications, timed beside each row.\ncold: the mean over the first 200 ms of calls of a row (the rows run in one process, in this order), for comparison only.'
);
if (sink === 42) console.log('');
