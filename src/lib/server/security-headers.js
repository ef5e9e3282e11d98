// Plain JavaScript so that svelte.config.js (the production server wrapper) and the hooks share one
// list. The Content-Security-Policy of pages is kit.csp in svelte.config.js (it needs nonces).

/**
 * Headers on every answer: pages, API, redirects, errors and the built assets.
 * Camera stays allowed for this site only: the warehouse scans labels with the phone camera.
 * @type {Readonly<Record<string, string>>}
 */
export const SECURITY_HEADERS = Object.freeze({
	'x-content-type-options': 'nosniff',
	'referrer-policy': 'same-origin',
	'x-frame-options': 'DENY',
	'permissions-policy':
		'camera=(self), microphone=(), geolocation=(), payment=(), usb=(), serial=(), bluetooth=(), midi=(), display-capture=(), accelerometer=(), gyroscope=(), magnetometer=()'
});

/**
 * The page policy for kit.csp (SvelteKit adds a nonce or hash for its own inline start-up script).
 * Nothing is loaded from other origins, and our components use no inline styles. The one inline
 * style attribute allowed is SvelteKit's own route announcer (the hash of its exact `style`); the
 * browser tests fail on any CSP violation, so a SvelteKit update that changes it is noticed.
 * @type {Record<string, string[]>}
 */
export const CSP_DIRECTIVES = {
	'default-src': ['self'],
	'script-src': ['self'],
	'style-src': ['self'],
	'style-src-attr': ['unsafe-hashes', 'sha256-S8qMpvofolR8Mpjy4kQvEm7m1q8clzU4dfDH0AmvZjo='],
	'img-src': ['self'],
	'font-src': ['self'],
	'connect-src': ['self'],
	'media-src': ['self'],
	'object-src': ['none'],
	'base-uri': ['self'],
	'form-action': ['self'],
	'frame-ancestors': ['none']
};
