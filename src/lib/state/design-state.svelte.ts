/**
 * The open design and its file identity. The design is replaced, never mutated, so every change
 * is one assignment that Svelte can track and the history can diff.
 */
import { getContext, setContext } from 'svelte';
import type { Design } from '$lib/core/design/schema';
import type { DesignIssue } from '$lib/core/design/issues';
import { parseDesignText, serializeDesign } from '$lib/core/design/parse-design';

export class DesignState {
	design = $state.raw<Design>(null as unknown as Design);
	fileName = $state('demo.sunglyph.json');
	/** Problems with the last file the user tried to open; the open design is untouched by them. */
	loadIssues = $state.raw<DesignIssue[]>([]);
	loadSource = $state('');

	constructor(initial: Design) {
		this.design = initial;
	}

	replace(next: Design) {
		this.design = next;
	}

	/** Opens JSON text; on any problem keeps the current design and records the issues. */
	open(text: string, fileName: string): boolean {
		const result = parseDesignText(text);
		if (!result.ok) {
			this.loadIssues = result.issues;
			this.loadSource = fileName;
			return false;
		}
		this.loadIssues = [];
		this.design = result.design;
		this.fileName = fileName;
		return true;
	}

	dismissIssues() {
		this.loadIssues = [];
	}

	serialize(): string {
		return serializeDesign(this.design);
	}
}

const KEY = Symbol('design-state');
export const setDesignState = (state: DesignState) => setContext(KEY, state);
export const getDesignState = () => getContext<DesignState>(KEY);
