/**
 * One routing worker per open document, kept while the user visits other tabs. A routed result
 * lands through the edit bridge as one undoable step and turns the plates layer on.
 */
import type { DesignState } from '$lib/state/design-state.svelte';
import type { EditBridge } from '$lib/state/edit-bridge.svelte';
import { GlassPlanning } from '$lib/state/glass-planning.svelte';

const plannings = new WeakMap<DesignState, GlassPlanning>();

export function planningFor(doc: DesignState, bridge: EditBridge | undefined): GlassPlanning {
	let planning = plannings.get(doc);
	if (!planning) {
		planning = new GlassPlanning({
			apply: (label, command) => {
				if (!bridge) return { ok: false, message: 'the editor is not ready' };
				const outcome = bridge.run(label, command);
				if (outcome.ok) bridge.controller?.editor.setLayer('plates', true);
				return outcome;
			}
		});
		plannings.set(doc, planning);
	}
	return planning;
}
