import { defineConfig } from '@playwright/test';

// PW_PORT lets several checkouts run their browser flows side by side.
const PORT = Number(process.env.PW_PORT ?? 4319);
export const TEST_BUILD_DIR = 'build-test';

export default defineConfig({
	testDir: 'tests/browser',
	timeout: 60_000,
	retries: process.env.CI ? 1 : 0,
	workers: 1,
	reporter: [['list']],
	use: {
		baseURL: `http://127.0.0.1:${PORT}`,
		viewport: { width: 1440, height: 900 },
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: [
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run',
				'--disable-quic',
				'--disable-gpu',
				'--no-sandbox'
			]
		}
	},
	webServer: {
		// Its own build folder: rebuilding build/ under a running `npm start` is never needed.
		command: `npm run build && PORT=${PORT} HOST=127.0.0.1 node scripts/serve.js`,
		env: { SUNGLYPH_BUILD_DIR: TEST_BUILD_DIR },
		url: `http://127.0.0.1:${PORT}`,
		reuseExistingServer: !process.env.CI,
		timeout: 180_000
	}
});
