/**
 * HTML to PDF through the system's Chromium in headless mode (no GPU). The HTML is written to a
 * temporary folder, printed there, and the PDF's bytes returned; nothing is left behind.
 */
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { CliError } from './cli-error';

const CANDIDATES = ['/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome'];
const PRINT_TIME_LIMIT_ms = 120_000;

export function findChromium(): string | null {
	const fromEnv = process.env.CHROMIUM_PATH;
	if (fromEnv && existsSync(fromEnv)) return fromEnv;
	return CANDIDATES.find((p) => existsSync(p)) ?? null;
}

export async function htmlToPdf(html: string): Promise<Uint8Array> {
	const chromium = findChromium();
	if (!chromium)
		throw new CliError(
			'--pdf needs Chromium; install it (Debian: apt-get install chromium) or set CHROMIUM_PATH'
		);
	const folder = await mkdtemp(join(tmpdir(), 'sunglyph-report-'));
	try {
		const htmlPath = join(folder, 'report.html');
		const pdfPath = join(folder, 'report.pdf');
		await writeFile(htmlPath, html);
		await run(chromium, [
			'--headless',
			'--disable-gpu',
			'--no-sandbox',
			'--no-first-run',
			'--disable-background-networking',
			'--disable-component-update',
			'--disable-sync',
			`--user-data-dir=${join(folder, 'profile')}`,
			'--no-pdf-header-footer',
			`--print-to-pdf=${pdfPath}`,
			pathToFileURL(htmlPath).href
		]);
		if (!existsSync(pdfPath)) throw new CliError('Chromium did not write the PDF', 3);
		return new Uint8Array(await readFile(pdfPath));
	} finally {
		await rm(folder, { recursive: true, force: true });
	}
}

function run(command: string, args: string[]): Promise<void> {
	return new Promise((resolve, reject) => {
		const child = spawn(command, args, { stdio: ['ignore', 'ignore', 'pipe'] });
		let stderr = '';
		child.stderr.on('data', (chunk) => (stderr = (stderr + chunk).slice(-2000)));
		const timer = setTimeout(() => child.kill('SIGKILL'), PRINT_TIME_LIMIT_ms);
		child.on('error', (error) => {
			clearTimeout(timer);
			reject(new CliError(`cannot start Chromium: ${error.message}`, 3));
		});
		child.on('close', (code) => {
			clearTimeout(timer);
			if (code === 0) resolve();
			else
				reject(
					new CliError(
						`Chromium failed to print (exit ${code}): ${stderr.trim().split('\n').at(-1) ?? ''}`,
						3
					)
				);
		});
	});
}
