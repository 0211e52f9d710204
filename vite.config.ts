import { sveltekit } from '@sveltejs/kit/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [sveltekit()],
	worker: { format: 'es' },
	test: {
		include: ['tests/**/*.test.ts'],
		environment: 'node',
		testTimeout: 60_000
	}
});
