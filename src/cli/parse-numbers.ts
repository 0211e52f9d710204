/** Strict parsing of numeric option values: anything but a clean finite number is an error. */
import { CliError } from './cli-error';
import { parseBiasText } from '../lib/core/drive/bias-text';

export function parseNumber(option: string, text: string | undefined): number {
	if (text === undefined || text.trim() === '')
		throw new CliError(`--${option}: expected a number`);
	const value = Number(text);
	if (!Number.isFinite(value)) throw new CliError(`--${option}: "${text}" is not a number`);
	return value;
}

export function parseInteger(option: string, text: string | undefined): number {
	const value = parseNumber(option, text);
	if (!Number.isInteger(value)) throw new CliError(`--${option}: "${text}" is not a whole number`);
	return value;
}

/** Bias written as "1/3", "1/3.5" or the divisor alone ("3"); returns the divisor a. */
export function parseBias(text: string | undefined): number {
	if (text === undefined) throw new CliError('--bias: expected a value such as 1/3');
	const result = parseBiasText(text);
	if (!result.ok) throw new CliError(`--bias: ${result.message}`);
	return result.divisor;
}

/**
 * Lets negative numbers follow an option ("--min-c -20"), which node's parseArgs would otherwise
 * read as an unknown option, by rewriting them as "--min-c=-20".
 */
export function joinNegativeValues(args: readonly string[]): string[] {
	const out: string[] = [];
	for (let i = 0; i < args.length; i++) {
		const next = args[i + 1];
		if (
			args[i].startsWith('--') &&
			!args[i].includes('=') &&
			next !== undefined &&
			/^-\d|^-\.\d/.test(next)
		) {
			out.push(`${args[i]}=${next}`);
			i++;
		} else {
			out.push(args[i]);
		}
	}
	return out;
}
