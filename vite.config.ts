import { fileURLToPath } from 'node:url';
import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import type { Plugin } from 'vite';
import { defineConfig } from 'vitest/config';

/**
 * The suggestion search's worker thread is its own entry of the server build (Vite bundles
 * `new Worker(new URL(…))` for the browser only): emitted as `search-worker.js`, then made one
 * self-contained file in BUILD_DIR/server by scripts/adapter-node-headers.js.
 */
function searchWorkerEntry(): Plugin {
	return {
		name: 'throwline:search-worker-entry',
		apply: 'build',
		buildStart() {
			if (this.environment?.config.consumer !== 'server') return;
			this.emitFile({ type: 'chunk', id: fileURLToPath(new URL('./src/lib/server/search/search-worker.ts', import.meta.url)), fileName: 'search-worker.js' });
		}
	};
}

export default defineConfig({
	plugins: [tailwindcss(), sveltekit(), searchWorkerEntry()],
	// MariaDB, uploads and mail live in .data/; watching them would reload the dev server on every write.
	server: { watch: { ignored: ['**/.data/**'] } },
	test: {
		include: ['src/**/*.spec.ts', 'tests/unit/**/*.spec.ts', 'tests/db/**/*.spec.ts', 'tests/fakes/**/*.spec.ts'],
		environment: 'node',
		testTimeout: 20_000,
		hookTimeout: 60_000
	}
});
