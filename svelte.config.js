import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';
import adapter from './scripts/adapter-node-headers.js';
import { CSP_DIRECTIVES } from './src/lib/server/security-headers.js';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// The tests build into their own folder so a running `npm start` is never rebuilt underneath.
		adapter: adapter({ out: process.env.BUILD_DIR || 'build' }),
		// Nonces on server-rendered pages, hashes on prerendered ones (SECURITY.md).
		csp: { mode: 'auto', directives: CSP_DIRECTIVES }
	}
};

export default config;
