import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { seedDemo } from '../../src/lib/server/demo/seed';
import { seedDemoAnalyses } from '../../src/lib/server/demo/analyses';
import { getAnalysis, listRevisions } from '../../src/lib/server/analyses';

useTempDb();

describe('the demo analyses', () => {
	it('saves six analyses in the demo projects, computed by the engine', async () => {
		const demo = await seedDemo();
		const ids = seedDemoAnalyses(demo.projectIds, demo.users);
		expect(ids).toHaveLength(6);
		const dana = demo.users.find((u) => u.role === 'viewer')!;
		const reader = { id: dana.id, email: dana.email, name: dana.name, via: 'session' as const };
		const saved = ids.map((id) => getAnalysis(reader, id).analysis);
		expect(saved.slice(0, 5).map((a) => a.kind)).toEqual([
			'shelf',
			'comparison',
			'joint',
			'shelf',
			'case'
		]);
		expect(saved[5].kind).toBe('wall');
		for (const a of saved) expect(a.summary.length).toBeGreaterThan(10);
		expect(listRevisions(reader, ids[0])).toHaveLength(2);
		// the pantry shelf is the demo's failing one (invented to show a fail and its fixes)
		expect(saved.slice(0, 5).map((a) => a.pass)).toEqual([true, true, true, false, true]);
		// the demo wall fails until its cases are fixed to the wall (the low units tip with their
		// drawers open): the screen's first suggestion
		expect(saved[5].pass).toBe(false);
		expect(saved[5].summary).toMatch(/fail/);
	});
});
