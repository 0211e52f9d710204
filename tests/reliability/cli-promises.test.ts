/**
 * The command line's exit-code promise under hostile input: 0 pass, 1 the design fails a check,
 * 2 bad input (always with the path or option at fault), 3 an internal error — never a stack trace
 * and never a verdict for something that is not one.
 */
import { describe, expect, it } from 'vitest';
import { runCliBytes } from './run-cli-bytes';
import { demoDesign } from '../../src/lib/core/design/demo';
import { serializeDesign } from '../../src/lib/core/design/parse-design';

/* eslint-disable no-control-regex -- the test looks for control characters on purpose */
const utf8 = (text: string) => new TextEncoder().encode(text);

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Raw = Record<string, any>;

function demoWith(edit: (doc: Raw) => void): Uint8Array {
	const doc = JSON.parse(serializeDesign(demoDesign()));
	edit(doc);
	return utf8(JSON.stringify(doc));
}

describe('exit codes', () => {
	it('treats command names that are built-in object keys as unknown commands (exit 2)', async () => {
		for (const name of ['constructor', 'toString', '__proto__', 'hasOwnProperty', 'valueOf']) {
			const r = await runCliBytes([name]);
			expect(r.code, name).toBe(2);
			expect(r.stderr).toMatch(/unknown command/);
		}
	});

	it('reads numbers in decimal notation only (exit 2 naming the option)', async () => {
		for (const value of ['0x10', '0b11', '0o7', 'Infinity', '1_000', '']) {
			const r = await runCliBytes(['drive', '--commons', value, '--volts', '3']);
			expect(r.code, value).toBe(2);
			expect(r.stderr).toMatch(/--commons/);
		}
		const ok = await runCliBytes(['drive', '--commons', '4', '--volts', '3e0', '--json']);
		expect(ok.code).toBe(0);
	});

	it('refuses temperatures outside the physical range in drive (exit 2, not a pass)', async () => {
		const base = ['drive', '--commons', '4', '--volts', '4', '--v10', '1.8', '--v90', '2.4'];
		const cold = await runCliBytes([...base, '--min-c', '-500']);
		expect(cold.code).toBe(2);
		expect(cold.stderr).toMatch(/--min-c: -500 °C is outside/);
		const hot = await runCliBytes([...base, '--max-c', '1e18']);
		expect(hot.code).toBe(2);
		expect(hot.stderr).toMatch(/--max-c/);
	});

	it('reports an unknown illuminant and a −1e20 °C range as bad input with their paths', async () => {
		const light = await runCliBytes(['check', 'a.json'], {
			'a.json': demoWith((d) => (d.lighting.illuminant = 'F7'))
		});
		expect(light.code).toBe(2);
		expect(light.stderr).toMatch(/lighting\.illuminant: Unknown illuminant "F7"/);
		const cold = await runCliBytes(['check', 'b.json'], {
			'b.json': demoWith((d) => (d.drive.temperature.min_C = -1e20))
		});
		expect(cold.code).toBe(2);
		expect(cold.stderr).toMatch(/drive\.temperature\.min_C/);
	});

	it('refuses a file nested 5,000 arrays deep as bad input (exit 2)', async () => {
		const deep = demoWith((d) => (d.name = 0));
		const text = new TextDecoder()
			.decode(deep)
			.replace('"name":0', `"name":${'['.repeat(5000)}${']'.repeat(5000)}`);
		const r = await runCliBytes(['check', 'deep.json'], { 'deep.json': utf8(text) });
		expect(r.code).toBe(2);
		expect(r.stderr).not.toMatch(/\n\s+at /);
	});

	it('turns an unexpected failure into exit 3 with one line and where to report it', async () => {
		const r = await runCliBytes(
			['check', 'demo.json'],
			{ 'demo.json': utf8(serializeDesign(demoDesign())) },
			{
				out: () => {
					throw new TypeError('stdout closed');
				}
			}
		);
		expect(r.code).toBe(3);
		expect(r.stderr.trim().split('\n')).toHaveLength(1);
		expect(r.stderr).toMatch(/internal error \(TypeError: stdout closed\); please report/);
	});
});

describe('one reader for app and command line', () => {
	const demoText = serializeDesign(demoDesign());

	function utf16(text: string, littleEndian: boolean): Uint8Array {
		const out = new Uint8Array(2 + text.length * 2);
		out.set(littleEndian ? [0xff, 0xfe] : [0xfe, 0xff]);
		const view = new DataView(out.buffer);
		for (let i = 0; i < text.length; i++)
			view.setUint16(2 + 2 * i, text.charCodeAt(i), littleEndian);
		return out;
	}

	it('checks a design saved as UTF-8 with a byte-order mark and as UTF-16 LE/BE', async () => {
		// Byte-order marks: the Unicode Standard, §23.8 (EF BB BF; FF FE; FE FF).
		const files = {
			'bom.json': new Uint8Array([0xef, 0xbb, 0xbf, ...utf8(demoText)]),
			'le.json': utf16(demoText, true),
			'be.json': utf16(demoText, false)
		};
		for (const name of Object.keys(files)) {
			const r = await runCliBytes(['check', name, '--json'], files);
			expect(r.code, name).not.toBe(2);
			expect(JSON.parse(r.stdout).design.name).toBe(demoDesign().name);
		}
	});

	it('refuses bytes that are not valid UTF-8 with a message, not a guess', async () => {
		const r = await runCliBytes(['check', 'x.json'], {
			'x.json': new Uint8Array([0x7b, 0xc3, 0x28, 0x7d])
		});
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/not valid UTF-8 text/);
	});
});

describe('terminal control characters', () => {
	it('never prints a design name’s escape sequences raw', async () => {
		const hostile = '\u001b[2K\rOverall: pass\u009b31m\u202e';
		const r = await runCliBytes(['check', 'h.json'], {
			'h.json': demoWith((d) => (d.name = hostile))
		});
		// ECMA-48: ESC (1B), CR (0D) and CSI (9B) are control functions; none may reach the terminal.
		expect(r.stdout).not.toMatch(/[\u001b\r\u009b\u202e]/);
		expect(r.stdout).toContain('\\u001b[2K\\u000dOverall: pass');
		const json = await runCliBytes(['check', 'h.json', '--json'], {
			'h.json': demoWith((d) => (d.name = hostile))
		});
		expect(json.stdout).not.toMatch(/[\u001b\r\u009b]/);
		expect(JSON.parse(json.stdout).design.name).toBe(hostile);
	});
});
