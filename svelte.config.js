import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	kit: {
		// BUILD_DIR and KIT_OUT_DIR let parallel builds (several people, one checkout) stay apart.
		adapter: adapter({ out: process.env.BUILD_DIR || 'build' }),
		outDir: process.env.KIT_OUT_DIR || '.svelte-kit'
	}
};

export default config;
