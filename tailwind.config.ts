import type { Config } from 'tailwindcss';

// Spanwright's own identity: a drafting table. Warm paper, graphite ink, one red-pencil accent,
// hairline rules. Pass and fail are also said in words and shapes, never by colour alone.
export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				paper: { DEFAULT: '#f4efe4', deep: '#ebe3d3', card: '#fbf8f1' },
				graphite: { DEFAULT: '#2a2926', soft: '#55524b', faint: '#6b665c', rule: '#cfc6b4' },
				pencil: { DEFAULT: '#b3401a', deep: '#8e3213', wash: '#f3dccf' },
				verdict: { pass: '#2f5d3a', fail: '#b3401a', warn: '#8a5a00' }
			},
			fontFamily: {
				sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
				mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace']
			},
			fontSize: {
				label: ['0.8125rem', { lineHeight: '1.1rem', letterSpacing: '0.02em' }],
				body: ['1rem', { lineHeight: '1.5rem' }],
				lead: ['1.125rem', { lineHeight: '1.65rem' }],
				title: ['1.5rem', { lineHeight: '2rem' }],
				display: ['2.125rem', { lineHeight: '2.5rem', letterSpacing: '-0.01em' }]
			},
			borderWidth: { hair: '0.5px' }
		}
	}
} satisfies Config;
