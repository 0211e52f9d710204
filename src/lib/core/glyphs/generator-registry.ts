/**
 * Every generator by kind, so a group's stored `generator: { kind, params }` can be run again.
 * Parameters are validated by each generator's zod schema; validation problems come back as one
 * GlyphError naming the parameter. Stored parameters are the resolved ones (defaults filled in,
 * unset optionals left out), so regeneration is reproducible.
 */
import { ZodError } from 'zod';
import { generateBarGraph } from './bar-graph';
import { GlyphError, type GeneratedGroup, type GeneratorParams } from './glyph-types';
import { generateIcon } from './icons/icon-library';
import {
	generateColon,
	generateDecimalPoint,
	generateDegree,
	generateMinus
} from './mark-generators';
import { generateSevenSegment } from './seven-segment';
import { generateStarburst } from './starburst-segments';
import { layoutText } from './text-layout';

type Generator = (params: never) => GeneratedGroup;

export const GENERATORS: Readonly<Record<string, Generator>> = {
	'seven-segment': generateSevenSegment,
	'fourteen-segment': (p: Parameters<typeof generateStarburst>[0]) =>
		generateStarburst(p, { count: 14 }),
	'sixteen-segment': (p: Parameters<typeof generateStarburst>[0]) =>
		generateStarburst(p, { count: 16 }),
	'decimal-point': generateDecimalPoint,
	colon: generateColon,
	minus: generateMinus,
	degree: generateDegree,
	text: layoutText,
	'bar-graph': generateBarGraph,
	icon: generateIcon
};

export const GENERATOR_KINDS = Object.keys(GENERATORS);

/** Drops unset (undefined) values, which a stored generator record cannot hold. */
export function storableParams(params: Readonly<Record<string, unknown>>): GeneratorParams {
	const out: GeneratorParams = {};
	for (const [k, v] of Object.entries(params)) {
		if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') out[k] = v;
	}
	return out;
}

export function runGenerator(
	kind: string,
	params: Readonly<Record<string, unknown>>
): GeneratedGroup {
	const generator = GENERATORS[kind];
	if (!generator) throw new GlyphError(`unknown generator "${kind}"`);
	try {
		const generated = (generator as (p: unknown) => GeneratedGroup)(params);
		return { ...generated, params: storableParams(generated.params) };
	} catch (error) {
		if (error instanceof ZodError) {
			const issue = error.issues[0];
			throw new GlyphError(`${kind}: ${issue.path.join('.') || 'parameters'}: ${issue.message}`, {
				param: issue.path.length > 0 ? String(issue.path[0]) : undefined,
				reason: issue.message
			});
		}
		throw error;
	}
}
