import { sveltekit } from '@sveltejs/kit/vite';
import { defineConfig } from 'vitest/config';

// Tests against two app processes behind nginx (scripts/test-cluster.sh). The SvelteKit plugin lets
// them write fixtures straight into the shared database with the app's own models. Run from the
// project's folder (SvelteKit sets the root to it).
export default defineConfig({
	plugins: [sveltekit()],
	test: {
		include: ['tests/cluster/**/*.cluster.ts'],
		fileParallelism: false,
		testTimeout: 60_000,
		hookTimeout: 60_000
	}
});
