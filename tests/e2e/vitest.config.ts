import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser tests drive Debian's chromium against the built app that scripts/test.sh started.
export default defineConfig({
	root: fileURLToPath(new URL('../..', import.meta.url)),
	test: {
		include: ['tests/e2e/**/*.e2e.ts'],
		fileParallelism: false,
		testTimeout: 60_000,
		hookTimeout: 60_000
	}
});
