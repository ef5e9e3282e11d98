import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// The tests build into their own folder so a running `npm start` is never rebuilt underneath.
		adapter: adapter({ out: process.env.BUILD_DIR || 'build' })
	}
};

export default config;
