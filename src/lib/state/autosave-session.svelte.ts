/**
 * Keeps the working design in IndexedDB and brings it back after a reload or a crash. On start it
 * looks for saved work first and only then begins saving, so the demo never overwrites it. Saves
 * are debounced and flushed when the page is hidden. A design equal to the demo is not kept.
 */
import type { Design } from '$lib/core/design/schema';
import { demoDesign } from '$lib/core/design/demo';
import { serializeDesign } from '$lib/core/design/parse-design';
import type { DesignState } from './design-state.svelte';
import { clearWorking, loadWorking, saveWorking } from './autosave-store';
import { createDebouncedSaver } from './autosave-debounce';

export const AUTOSAVE_DELAY_ms = 600;

interface Snapshot {
	design: Design;
	fileName: string;
}

export class AutosaveSession {
	/** Set when work was recovered at start, until the user keeps or discards it. */
	recovered = $state.raw<{ savedAt: Date; fileName: string } | null>(null);
	/** When the working design was last kept, in ms since the epoch. */
	lastSaved_ms = $state<number | null>(null);
	failed = $state(false);
	/** True once saved work has been looked for and changes are being kept. */
	armed = $state(false);
	#doc: DesignState;
	/** The document serial of the recovered work: a later Open makes the notice moot. */
	#recoveredSerial = -1;
	#demoText = serializeDesign(demoDesign());
	#saver = createDebouncedSaver<Snapshot>({
		delay_ms: AUTOSAVE_DELAY_ms,
		save: async (s) => {
			if (serializeDesign(s.design) === this.#demoText) await clearWorking();
			else await saveWorking(s);
			this.lastSaved_ms = Date.now();
			this.failed = false;
		},
		onError: () => (this.failed = true)
	});

	constructor(doc: DesignState) {
		this.#doc = doc;
	}

	/** Restores saved work, if any differs from what is open, then starts saving changes. */
	async start(): Promise<void> {
		const work = await loadWorking();
		if (work && work.text !== serializeDesign(this.#doc.design)) {
			this.#doc.replaceDocument(work.design, work.fileName);
			this.#recoveredSerial = this.#doc.documentSerial;
			this.recovered = { savedAt: work.savedAt, fileName: work.fileName };
		}
		this.armed = true;
	}

	/**
	 * Call on every change of the open design. Opening another document answers the recovery
	 * notice: the recovered work is no longer what is open, so Discard must not replace it.
	 */
	observe(design: Design, fileName: string, documentSerial = this.#doc.documentSerial): void {
		if (this.recovered && documentSerial !== this.#recoveredSerial) this.recovered = null;
		if (this.armed) this.#saver.schedule({ design, fileName });
	}

	flush(): Promise<void> {
		return this.#saver.flush();
	}

	keep(): void {
		this.recovered = null;
	}

	discard(): void {
		const stillOpen = this.recovered !== null && this.#doc.documentSerial === this.#recoveredSerial;
		this.recovered = null;
		if (!stillOpen) return;
		this.#saver.cancel();
		this.#doc.replaceDocument(demoDesign(), 'demo.sunglyph.json');
		void clearWorking();
	}
}
