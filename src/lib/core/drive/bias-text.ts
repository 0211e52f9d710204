/**
 * Bias as people write it: "1/3", "1/3.5" or the divisor alone ("3"). Returns the divisor a.
 */
export type BiasParse = { ok: true; divisor: number } | { ok: false; message: string };

export function parseBiasText(text: string): BiasParse {
	const match = /^\s*(?:1\s*\/\s*)?([0-9]*\.?[0-9]+)\s*$/.exec(text);
	const divisor = match ? Number(match[1]) : NaN;
	if (!Number.isFinite(divisor))
		return { ok: false, message: `"${text}" is not a bias such as 1/3` };
	if (divisor < 2)
		return { ok: false, message: `1/${divisor} is not a usable bias (need 1/2 or smaller)` };
	return { ok: true, divisor };
}

export function formatBias(divisor: number): string {
	return `1/${Number(divisor.toFixed(4))}`;
}
