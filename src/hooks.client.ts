import { z } from 'zod';

// The page's CSP allows no eval (svelte.config.js), so zod's check whether it may compile its
// parsers (new Function) is refused and reported as a CSP violation. In the browser, zod parses
// without compiling, and never makes that check.
z.config({ jitless: true });
