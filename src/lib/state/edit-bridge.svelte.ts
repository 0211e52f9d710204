/**
 * Lets panels outside the editor (the Wiring tab) edit the design through the editor's undo
 * history and select electrodes on its drawing. The editor workspace attaches its controller; until
 * it has, edits are applied straight to the design (still as core command patches).
 */
import { getContext, setContext } from 'svelte';
import type { Design } from '$lib/core/design/schema';
import { applyPatch, type Patch } from '$lib/core/commands/patch';
import type { DesignState } from './design-state.svelte';
import type { EditorController } from './editor-controller.svelte';
import { messageOf, type EditOutcome } from './edit-session.svelte';
import { EMPTY_IDS, idSet } from '$lib/editor/id-set';

export class EditBridge {
	controller = $state.raw<EditorController | null>(null);
	#doc: DesignState;

	constructor(doc: DesignState) {
		this.#doc = doc;
	}

	attach(controller: EditorController): () => void {
		this.controller = controller;
		return () => {
			if (this.controller === controller) this.controller = null;
		};
	}

	/** The design as the editor sees it (live during a drag), else the document's. */
	get design(): Design {
		return this.controller?.session.design ?? this.#doc.design;
	}

	run(label: string, command: (design: Design) => Patch): EditOutcome {
		if (this.controller) return this.controller.session.run(label, command);
		try {
			const patch = command(this.#doc.design);
			this.#doc.replace(applyPatch(this.#doc.design, patch));
			return { ok: true, patch };
		} catch (error) {
			return { ok: false, message: messageOf(error) };
		}
	}

	undo(): boolean {
		return this.controller?.session.undo() ?? false;
	}

	select(ids: Iterable<string>): void {
		if (this.controller) this.controller.selection = idSet(ids);
	}

	get selection(): ReadonlySet<string> {
		return this.controller?.selection ?? EMPTY_IDS;
	}
}

const KEY = Symbol('edit-bridge');
export const setEditBridge = (bridge: EditBridge) => setContext(KEY, bridge);
export const getEditBridge = () => getContext<EditBridge | undefined>(KEY);
