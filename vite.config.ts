import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	test: {
		include: ['tests/engine/**/*.test.ts', 'tests/server/**/*.test.ts', 'tests/unit/**/*.test.ts'],
		benchmark: { include: ['tests/bench/**/*.bench.ts'] },
		environment: 'node',
		pool: 'forks',
		testTimeout: 20000
	}
});
