import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Fault tests stop and start services, so they get their own world (world.ts) and run one file at
// a time; timeouts are generous because a test waits out outages and webhook retries on purpose.
export default defineConfig({
	root: fileURLToPath(new URL('../..', import.meta.url)),
	test: {
		include: ['tests/faults/**/*.fault.ts'],
		globalSetup: ['tests/faults/world.ts'],
		fileParallelism: false,
		testTimeout: 90_000,
		hookTimeout: 120_000
	}
});
