/**
 * The open design and its file identity. The design is replaced, never mutated, so every change
 * is one assignment that Svelte can track and the history can diff. `documentSerial` changes when
 * a different document is opened (file, recovery, demo), which tells the editor to start a fresh
 * undo history instead of recording the swap as an edit.
 */
import { getContext, setContext } from 'svelte';
import type { Design } from '$lib/core/design/schema';
import type { DesignIssue } from '$lib/core/design/issues';
import { parseDesignText, serializeDesign } from '$lib/core/design/parse-design';

export class DesignState {
	design = $state.raw<Design>(null as unknown as Design);
	fileName = $state('demo.sunglyph.json');
	documentSerial = $state(0);
	/** Problems with the last file the user tried to open; the open design is untouched by them. */
	loadIssues = $state.raw<DesignIssue[]>([]);
	loadSource = $state('');

	constructor(initial: Design) {
		this.design = initial;
	}

	replace(next: Design) {
		this.design = next;
	}

	/** Swaps in another document (recovered work, the demo): a new undo history starts. */
	replaceDocument(next: Design, fileName: string) {
		this.design = next;
		this.fileName = fileName;
		this.documentSerial++;
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
		this.replaceDocument(result.design, fileName);
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
