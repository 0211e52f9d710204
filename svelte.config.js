import adapter from '@sveltejs/adapter-node';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
	preprocess: vitePreprocess(),
	// SUNGLYPH_BUILD_DIR lets the browser tests build into a folder of their own.
	kit: { adapter: adapter({ out: process.env.SUNGLYPH_BUILD_DIR ?? 'build' }) },
	compilerOptions: { runes: true }
};

export default config;
