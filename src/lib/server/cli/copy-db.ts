// `npm run db:copy -- FROM TO`: copy a shop's database between the engines, then check the copy.
// FROM and TO are each a SQLite file (a path, or sqlite:path) or a PostgreSQL URL (postgres://…);
// TO must be new or empty (it is migrated first). Every table is counted on both sides and every row
// compared; any difference is printed and the exit status is 1.
//   npm run db:copy -- data/spanwright.db postgres://spanwright@db.example/spanwright
//   npm run db:copy -- postgres://spanwright@db.example/spanwright /tmp/back.db
import { checkCopy, copyTables, openSide } from '../db/copy';

const [fromArg, toArg] = process.argv.slice(2);
if (!fromArg || !toArg) {
	console.error('Usage: npm run db:copy -- FROM TO  (a SQLite file or a postgres:// URL each)');
	process.exit(2);
}
const shown = (where: string) => where.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:…@');
const from = await openSide(fromArg);
const to = await openSide(toArg);
try {
	await copyTables(from, to);
	const checks = await checkCopy(from, to);
	let bad = 0;
	for (const c of checks) {
		const ok = c.source === c.target && c.differences.length === 0;
		if (!ok) bad++;
		console.log(
			`${ok ? 'ok  ' : 'BAD '} ${c.table.padEnd(20)} ${String(c.source).padStart(7)} → ${String(c.target).padStart(7)} rows${c.differences.length ? `  ${c.differences.join('; ')}` : ''}`
		);
	}
	console.log(
		bad
			? `${bad} table(s) differ between ${shown(fromArg)} and ${shown(toArg)}.`
			: `Copied ${shown(fromArg)} to ${shown(toArg)}: every table counted and every row compared alike.`
	);
	process.exitCode = bad ? 1 : 0;
} finally {
	await from.opened.close();
	await to.opened.close();
}
