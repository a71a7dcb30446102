// Every API route that touches stored data × who is asking → the expected status (the table and
// who is who: support/api-table.ts), and the share link's pages, which only its token opens.
import { randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { actorOf, castWithProject, expected, table, WHOS } from './support/api-table';
import { saveShelf } from './support/analyses';
import { createShareLink, revokeShareLink } from '../../src/lib/server/share-links';
import * as sharedPage from '../../src/routes/shared/[token]/+page.server';
import * as sharedPdf from '../../src/routes/shared/[token]/record.pdf/+server';

useTempDb();

describe('authorization of every stored-data API route', () => {
	for (const row of table)
		for (const who of WHOS)
			it(`${row.route} as ${who} → ${expected(row, who)}`, async () => {
				// a fresh workshop and project per case, so a delete in one case cannot colour another
				const { cast, project } = await castWithProject();
				const res = await row.call(actorOf(cast, who), cast, project.id);
				expect(res.status).toBe(expected(row, who));
				if (res.status >= 400) {
					const body = await res.json();
					expect(typeof body.error).toBe('string');
					expect(Array.isArray(body.issues)).toBe(true);
				}
			});
});

// the share link opens for whoever holds its token, signed in or not, and for nobody else
const statusOf = async (open: () => Promise<Response>) => {
	try {
		return (await open()).status;
	} catch (e) {
		return (e as { status: number }).status;
	}
};
const shared: { route: string; open: (token: string) => Promise<number>; revoked?: boolean }[] = [
	{
		route: 'GET /shared/{token}',
		open: (token) =>
			statusOf(async () => {
				await sharedPage.load({ params: { token }, setHeaders: () => {} } as never);
				return new Response(null, { status: 200 });
			})
	},
	{
		route: 'GET /shared/{token}/record.pdf',
		open: (token) => statusOf(async () => sharedPdf.GET({ params: { token } } as never))
	}
];
for (const s of [...shared])
	shared.push({ ...s, route: `${s.route} after revoking`, revoked: true });

describe('share links: only the token opens the record', () => {
	for (const row of shared)
		for (const who of WHOS) {
			const status = row.revoked || who !== 'shareHolder' ? 404 : 200;
			it(`${row.route} as ${who} → ${status}`, async () => {
				const { cast, project } = await castWithProject();
				await saveShelf(cast.owner, project.id);
				const { link, token } = await createShareLink(cast.editor, project.id, { days: 7 });
				if (row.revoked) await revokeShareLink(cast.editor, project.id, link.id);
				// everyone but the holder presents a token of the right shape that is not this one
				const presented: string =
					who === 'shareHolder' ? token : randomBytes(32).toString('base64url');
				expect(await row.open(presented)).toBe(status);
			});
		}
});
