import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	// MariaDB, uploads and mail live in .data/; watching them would reload the dev server on every write.
	server: { watch: { ignored: ['**/.data/**'] } },
	test: {
		include: ['src/**/*.spec.ts', 'tests/unit/**/*.spec.ts', 'tests/db/**/*.spec.ts', 'tests/fakes/**/*.spec.ts'],
		environment: 'node',
		testTimeout: 20_000,
		hookTimeout: 60_000
	}
});
