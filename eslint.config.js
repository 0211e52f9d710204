import js from '@eslint/js';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

export default ts.config(
	{
		ignores: [
			'build/',
			'build-test/',
			'dist/',
			'.svelte-kit/',
			'node_modules/',
			'test-results/',
			'playwright-report/'
		]
	},
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	{ languageOptions: { globals: { ...globals.browser, ...globals.node } } },
	{
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				projectService: true,
				extraFileExtensions: ['.svelte'],
				parser: ts.parser,
				svelteConfig
			}
		}
	},
	{
		rules: {
			'@typescript-eslint/no-unused-vars': [
				'error',
				{ argsIgnorePattern: '^_', varsIgnorePattern: '^_' }
			]
		}
	},
	{
		// The core is pure: no Svelte, no SvelteKit app modules, no UI or editor code, no DOM globals.
		files: ['src/lib/core/**/*.ts'],
		languageOptions: { globals: { ...globals.es2022 } },
		rules: {
			'no-restricted-imports': [
				'error',
				{
					patterns: [
						{ group: ['svelte', 'svelte/*'], message: 'core/ must not import Svelte.' },
						{ group: ['$app/*', '@sveltejs/*'], message: 'core/ must not import SvelteKit.' },
						{
							group: [
								'**/ui/**',
								'$lib/ui/*',
								'**/editor/**',
								'$lib/editor/*',
								'**/state/**',
								'$lib/state/*'
							],
							message: 'core/ must not import UI code.'
						},
						{
							group: ['paper', 'paper/*', 'd3', 'd3-*', '@observablehq/*'],
							message:
								'core/ must not import view libraries (paper.js only in geometry/paper-kernel.ts).'
						},
						{
							group: ['clipper-lib'],
							message: 'clipper-lib only in geometry/polygon-clipper.ts.'
						}
					]
				}
			]
		}
	},
	{
		// The one place the core uses paper.js: as a headless geometry kernel for curve booleans.
		files: ['src/lib/core/geometry/paper-kernel.ts'],
		rules: { 'no-restricted-imports': 'off' }
	},
	{
		// The one place the core uses the integer clipping library: robust booleans and offsets.
		files: ['src/lib/core/geometry/polygon-clipper.ts'],
		rules: { 'no-restricted-imports': 'off' }
	}
);
