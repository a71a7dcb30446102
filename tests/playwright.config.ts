import { defineConfig, devices } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 4173);

// Journeys run against the built server (as it would be deployed) on a temporary data folder,
// in Debian's Chromium. Never `playwright install`: the browser comes from apt.
export default defineConfig({
	testDir: './e2e',
	outputDir: '../test-results',
	timeout: 60_000,
	expect: { timeout: 10_000 },
	workers: 2,
	retries: process.env.CI ? 1 : 0,
	reporter: process.env.CI ? [['list']] : [['list']],
	use: {
		baseURL: `http://localhost:${PORT}`,
		trace: 'retain-on-failure',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: [
				'--headless',
				'--no-sandbox',
				'--disable-gpu',
				'--disable-quic',
				'--no-first-run',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync'
			]
		}
	},
	// One browser; the journeys set a 375 px phone viewport themselves where they check it.
	projects: [{ name: 'desktop', use: { ...devices['Desktop Chrome'], channel: undefined } }],
	webServer: {
		command: `npx tsx tests/e2e/support/server.ts`,
		cwd: '..',
		port: PORT,
		timeout: 180_000,
		reuseExistingServer: false,
		env: { E2E_PORT: String(PORT) }
	}
});
