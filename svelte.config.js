import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	compilerOptions: { runes: true },
	kit: {
		adapter: adapter(),
		// Cross-site form posts are refused by our own origin check (src/lib/server/hooks/
		// origin-check.ts), which answers the API in JSON; '*' turns SvelteKit's text-only one off.
		csrf: { trustedOrigins: ['*'] },
		// Every page's stylesheets (the app's own, about 38 kB before compression, and each screen's
		// few hundred bytes) go inside its HTML: the first paint waits for no stylesheet request.
		// The CSP already allows inline styles (style-src 'unsafe-inline').
		inlineStyleThreshold: 40_000,
		csp: {
			mode: 'auto',
			directives: {
				'default-src': ['self'],
				'script-src': ['self'],
				'style-src': ['self', 'unsafe-inline'],
				'img-src': ['self', 'data:'],
				'font-src': ['self'],
				'connect-src': ['self'],
				'frame-ancestors': ['none'],
				'form-action': ['self'],
				'base-uri': ['self'],
				'object-src': ['none']
			}
		}
	}
};

export default config;
