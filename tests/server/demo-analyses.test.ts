import { describe, expect, it } from 'vitest';
import { useTempDb } from './support/db';
import { seedDemo } from '../../src/lib/server/demo/seed';
import { seedDemoAnalyses } from '../../src/lib/server/demo/analyses';
import { getAnalysis, listRevisions } from '../../src/lib/server/analyses';

useTempDb();

describe('the demo analyses', () => {
	it('saves five analyses in the demo projects, computed by the engine', async () => {
		const demo = await seedDemo();
		const ids = seedDemoAnalyses(demo.projectIds, demo.users);
		expect(ids).toHaveLength(5);
		const dana = demo.users.find((u) => u.role === 'viewer')!;
		const reader = { id: dana.id, email: dana.email, name: dana.name, via: 'session' as const };
		const saved = ids.map((id) => getAnalysis(reader, id).analysis);
		expect(saved.map((a) => a.kind)).toEqual(['shelf', 'comparison', 'joint', 'shelf', 'case']);
		for (const a of saved) expect(a.summary.length).toBeGreaterThan(10);
		expect(listRevisions(reader, ids[0])).toHaveLength(2);
		// the pantry shelf is the demo's failing one (invented to show a fail and its fixes)
		expect(saved.map((a) => a.pass)).toEqual([true, true, true, false, true]);
	});
});
