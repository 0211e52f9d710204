/**
 * The demo design shipped with sunglyph (a fictional garden-water timer's readout), built by
 * scripts/build-demo.ts and kept as a file so it opens on first start.
 */
import demoJson from './demo-design.json';
import { parseDesignValue } from './parse-design';
import type { Design } from './schema';
import { DesignError } from './issues';

export function demoDesign(): Design {
	const result = parseDesignValue(JSON.parse(JSON.stringify(demoJson)));
	if (!result.ok) throw new DesignError(result.issues);
	return result.design;
}
