import { demoDesign } from '../../src/lib/core/design/demo';
import type { Design } from '../../src/lib/core/design/schema';
import { planGlass } from '../../src/lib/core/glass/plan-glass';

let routed: Design | null = null;

/** The demo with its glass drawing generated (transfer points and traces), computed once. */
export function routedDemo(): Design {
	if (!routed) {
		const demo = demoDesign();
		routed = { ...demo, glassArt: planGlass(demo).glassArt };
	}
	return routed;
}
