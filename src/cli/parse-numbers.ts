/** Strict parsing of numeric option values: anything but a clean finite number is an error. */
import { CliError } from './cli-error';
import { parseBiasText } from '../lib/core/drive/bias-text';

export function parseNumber(option: string, text: string | undefined): number {
	if (text === undefined || text.trim() === '')
		throw new CliError(`--${option}: expected a number`);
	if (!DECIMAL.test(text.trim()))
		throw new CliError(`--${option}: "${text}" is not a decimal number (such as 12, -3.5 or 1e3)`);
	const value = Number(text);
	if (!Number.isFinite(value)) throw new CliError(`--${option}: "${text}" is out of range`);
	return value;
}

/** Decimal notation only: no hexadecimal, binary or octal prefixes, no "Infinity". */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** A decimal number within [min, max], with the range and unit named when it is outside. */
export function parseNumberWithin(
	option: string,
	text: string | undefined,
	range: { min: number; max: number; unit: string }
): number {
	const value = parseNumber(option, text);
	if (value < range.min || value > range.max) {
		const u = range.unit ? ` ${range.unit}` : '';
		throw new CliError(`--${option}: ${value}${u} is outside ${range.min} to ${range.max}${u}`);
	}
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
