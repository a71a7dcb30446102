/** The usual security headers of every answer (the CSP itself comes from svelte.config.js). */
export const SECURITY_HEADERS: Readonly<Record<string, string>> = {
	'X-Content-Type-Options': 'nosniff',
	'Referrer-Policy': 'strict-origin-when-cross-origin',
	'X-Frame-Options': 'DENY',
	'Permissions-Policy':
		'camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()',
	'Cross-Origin-Opener-Policy': 'same-origin'
};

/** Outside development, browsers are told to keep to https for two years. */
export const HSTS = 'max-age=63072000; includeSubDomains';
