import type { ClientInit } from '@sveltejs/kit';
import { z } from 'zod';

// The page's CSP allows no eval (svelte.config.js), so zod's check whether it may compile its
// parsers (new Function) is refused and reported as a CSP violation. In the browser, zod parses
// without compiling, and never makes that check.
z.config({ jitless: true });

/**
 * The page the server rendered is painted before the app takes it over: hydrating a screen (its
 * modules, its first computation) takes a phone a good part of a second, and the reader sees the
 * page meanwhile. Waits for the next frame to be painted, or 100 ms where no frame comes (a tab in
 * the background paints none).
 */
export const init: ClientInit = () =>
	new Promise<void>((painted) => {
		requestAnimationFrame(() => setTimeout(painted, 0));
		setTimeout(painted, 100);
	});
