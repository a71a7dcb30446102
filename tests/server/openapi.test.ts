// The API document is generated from the zod schemas; here every operation's real answers are
// validated against what the document says (ajv, JSON Schema 2020-12 as OpenAPI 3.1 uses), and the
// document passes a standard OpenAPI linter with no errors.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { openApiDocument, operations } from '../../src/lib/server/openapi';
import { actorOf, castWithProject, table, WHOS } from './support/api-table';
import { computeTable } from './support/compute-table';
import { useTempDb } from './support/db';

useTempDb();

interface Doc {
	info: { license?: { name: string } };
	paths: Record<
		string,
		Record<
			string,
			{
				operationId?: string;
				parameters?: { in: string; name: string }[];
				responses: Record<string, { content?: Record<string, unknown> }>;
			}
		>
	>;
}
// the document as the API serves it (JSON)
const doc: Doc = JSON.parse(JSON.stringify(openApiDocument('0.0.0-test')));
const ajv = new Ajv2020({ strict: false, allErrors: true, validateFormats: false });
ajv.addSchema(doc as object, 'openapi');

const pointer = (s: string) => s.replace(/~/g, '~0').replace(/\//g, '~1');

/** Validate one real answer against the document; the failure message says what and where. */
async function validate(route: string, res: Response) {
	const [method, path] = route.split(' ');
	const op = doc.paths[path]?.[method.toLowerCase()];
	expect(op, `${route} is documented`).toBeDefined();
	const documented = op.responses[String(res.status)];
	expect(documented, `${route} documents status ${res.status}`).toBeDefined();
	if (res.status === 204) return;
	expect(res.headers.get('content-type')).toMatch(/^application\/json/);
	const body = await res.json();
	const ref = `openapi#/paths/${pointer(path)}/${method.toLowerCase()}/responses/${res.status}/content/application~1json/schema`;
	const check = ajv.getSchema(ref) ?? ajv.compile({ $ref: ref });
	const ok = check(body);
	expect(ok, `${route} ${res.status}: ${ajv.errorsText(check.errors)}`).toBe(true);
}

const seen = new Set<string>();

describe('every answer of the stored-data routes matches the document', () => {
	for (const row of table)
		it(`${row.route}`, async () => {
			for (const who of WHOS) {
				const { cast, project } = await castWithProject();
				const res = await row.call(actorOf(cast, who), cast, project.id);
				const route = row.route.replace(/ \(.*\)$/, '');
				await validate(route, res);
				seen.add(route);
			}
		});
});

describe('every answer of the open compute routes matches the document', () => {
	for (const row of computeTable)
		it(`${row.route}: ${row.label}`, async () => {
			const res = await row.call();
			expect(res.status).toBe(row.status);
			await validate(row.route, res);
			seen.add(row.route);
		});
});

describe('the document', () => {
	it('has every operation exercised above', () => {
		const all = operations.map((op) => `${op.method.toUpperCase()} ${op.path}`);
		expect(all.filter((r) => !seen.has(r))).toEqual([]);
	});

	it('names every operation once, declares every path parameter, and has a refusal and a body schema for each', () => {
		const ids = new Set<string>();
		for (const [path, item] of Object.entries(doc.paths))
			for (const [method, op] of Object.entries(item)) {
				expect(op.operationId, `${method} ${path}`).toMatch(/^[a-z][A-Za-z]+$/);
				expect(ids.has(op.operationId!), `${op.operationId} is unique`).toBe(false);
				ids.add(op.operationId!);
				const declared = (op.parameters ?? []).filter((p) => p.in === 'path').map((p) => p.name);
				const inPath = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
				expect(declared.sort()).toEqual(inPath.sort());
				const codes = Object.keys(op.responses).map(Number);
				expect(
					codes.some((c) => c >= 400 && c < 500),
					`${method} ${path} has a 4xx`
				).toBe(true);
				for (const c of codes.filter((c) => c >= 200 && c < 300 && c !== 204))
					expect(op.responses[c].content, `${method} ${path} ${c} has a body schema`).toBeDefined();
			}
		expect(doc.info.license?.name).toBeTruthy();
	});

	it('passes the OpenAPI linter (recommended rules) with no errors', () => {
		const dir = mkdtempSync(join(tmpdir(), 'spanwright-openapi-'));
		const file = join(dir, 'openapi.json');
		writeFileSync(file, JSON.stringify(doc));
		const run = spawnSync(
			process.execPath,
			['node_modules/@redocly/cli/bin/cli.js', 'lint', file, '--format', 'json'],
			{ encoding: 'utf8', env: { ...process.env, REDOCLY_TELEMETRY: 'off', NO_COLOR: '1' } }
		);
		const report = JSON.parse(run.stdout.slice(run.stdout.indexOf('{'))) as {
			totals: { errors: number; warnings: number };
			problems: { ruleId: string; message: string; severity: string }[];
		};
		expect(report.problems.filter((p) => p.severity === 'error')).toEqual([]);
		expect(report.totals.errors).toBe(0);
		expect(report.totals.warnings).toBe(0);
	}, 60_000);
});
