import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	test: {
		projects: [
			{
				extends: './vite.config.ts',
				test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' }
			},
			{
				extends: './vite.config.ts',
				test: {
					name: 'integration',
					include: ['tests/integration/**/*.test.ts'],
					environment: 'node',
					setupFiles: ['tests/integration/setup.ts'],
					testTimeout: 60_000
				}
			},
			{
				// Two built instances on PostgreSQL and the S3 stand-in: `npm run test:postgres`.
				test: {
					name: 'scale',
					include: ['tests/scale/**/*.test.ts'],
					environment: 'node',
					testTimeout: 120_000,
					hookTimeout: 240_000
				}
			},
			{
				test: {
					name: 'e2e',
					include: ['tests/e2e/**/*.test.ts'],
					environment: 'node',
					globalSetup: ['tests/e2e/global-setup.ts'],
					testTimeout: 90_000,
					hookTimeout: 120_000,
					fileParallelism: false
				}
			}
		]
	}
});
