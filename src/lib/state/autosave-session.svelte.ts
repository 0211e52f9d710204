/**
 * Keeps every design the user works on in IndexedDB, one record per design, and brings work back
 * after a reload or a crash. Edits are written within about 100 ms (a short batch, never longer),
 * so a browser that dies right after an edit still has it. On start, saved work is looked for
 * first and only then is anything written, so the demo never overwrites it; recovered work is
 * announced and can be set aside without being deleted. Another tab editing the same design is
 * detected (a Web Lock per open design, and a broadcast on each write) and reported.
 */
import type { Design } from '$lib/core/design/schema';
import { demoDesign } from '$lib/core/design/demo';
import { serializeDesign } from '$lib/core/design/parse-design';
import { readDesignBytes } from '$lib/core/design/read-design-bytes';
import {
	designFromTemplate,
	fileNameForDesign,
	type TemplateId
} from '$lib/core/design/design-templates';
import type { DesignState } from './design-state.svelte';
import {
	adoptLegacyWorking,
	getDesign,
	listDesigns,
	newDesignId,
	parkDesign,
	putDesign,
	type StoredDesign
} from './autosave-store';
import { createDebouncedSaver } from './autosave-debounce';

/** Quiet time after an edit before it is written, and the longest an edit may wait. */
export const AUTOSAVE_DELAY_ms = 40;
export const AUTOSAVE_MAX_WAIT_ms = 100;
const TAB_KEY = 'sunglyph.tab-design';
const CHANNEL = 'sunglyph-designs';

interface Snapshot {
	id: string;
	design: Design;
	fileName: string;
	unsaved: boolean;
}

export class AutosaveSession {
	/** Set when work was recovered at start, until the user keeps or sets it aside. */
	recovered = $state.raw<{ savedAt: Date; name: string } | null>(null);
	/** When the open design was last written to this browser's storage, ms since the epoch. */
	lastSaved_ms = $state<number | null>(null);
	failed = $state(false);
	/** True once saved work has been looked for and changes are being kept. */
	armed = $state(false);
	/** Id of the open design's record. */
	designId = $state(newDesignId());
	/** The open design has changes not yet saved to a file. */
	unsaved = $state(false);
	/** Another tab has the open design open too. */
	otherTab = $state(false);
	recent = $state.raw<StoredDesign[]>([]);

	#doc: DesignState;
	#demoText = serializeDesign(demoDesign());
	#serial = -1;
	#lastDesign: Design | null = null;
	#tab = newDesignId();
	#channel: BroadcastChannel | null = null;
	#releaseLock: (() => void) | null = null;
	#saver = createDebouncedSaver<Snapshot>({
		delay_ms: AUTOSAVE_DELAY_ms,
		maxWait_ms: AUTOSAVE_MAX_WAIT_ms,
		leading: true,
		save: async (s) => {
			const text = serializeDesign(s.design);
			if (!s.unsaved && text === this.#demoText) return;
			await putDesign({
				id: s.id,
				name: s.design.name,
				fileName: s.fileName,
				text,
				changedAt_ms: Date.now(),
				unsaved: s.unsaved
			});
			this.#channel?.postMessage({ tab: this.#tab, id: s.id });
			this.lastSaved_ms = Date.now();
			this.failed = false;
		},
		onError: () => (this.failed = true)
	});

	constructor(doc: DesignState) {
		this.#doc = doc;
	}

	/** True while an edit has not reached storage yet (leaving now could lose it). */
	get atRisk(): boolean {
		return this.#saver.pending || this.failed;
	}

	/** Restores this tab's design or the latest unsaved work, then starts keeping changes. */
	async start(): Promise<void> {
		this.#listen();
		try {
			await adoptLegacyWorking();
			const tabId = sessionStorage.getItem(TAB_KEY);
			const own = tabId ? await getDesign(tabId) : null;
			let pick: StoredDesign | null = own?.readable && (await this.#free(tabId!)) ? own : null;
			if (!pick) {
				for (const item of await listDesigns()) {
					const candidate = item.record.unsaved && !item.record.parked;
					if (item.readable && candidate && (await this.#free(item.record.id))) {
						pick = item;
						break;
					}
				}
			}
			if (pick?.readable) {
				this.#switchTo({
					id: pick.record.id,
					design: pick.design,
					fileName: pick.record.fileName,
					unsaved: pick.record.unsaved
				});
				if (pick.record.id !== tabId)
					// eslint-disable-next-line svelte/prefer-svelte-reactivity -- a fixed moment, never mutated
					this.recovered = { savedAt: new Date(pick.record.changedAt_ms), name: pick.design.name };
			}
		} catch {
			this.failed = true;
		}
		this.armed = true;
		this.#keepOpenDesign();
	}

	#listen() {
		if (typeof BroadcastChannel === 'undefined') return;
		this.#channel = new BroadcastChannel(CHANNEL);
		this.#channel.onmessage = (event: MessageEvent<{ tab: string; id: string }>) => {
			if (event.data?.tab !== this.#tab && event.data?.id === this.designId) this.otherTab = true;
		};
	}

	/** True when no other tab holds the design's lock (always true without Web Locks). */
	async #free(id: string): Promise<boolean> {
		if (typeof navigator === 'undefined' || !navigator.locks) return true;
		const state = await navigator.locks.query();
		return !(state.held ?? []).some((l) => l.name === `sunglyph-design:${id}`);
	}

	#hold(id: string) {
		this.#releaseLock?.();
		this.#releaseLock = null;
		this.otherTab = false;
		try {
			sessionStorage.setItem(TAB_KEY, id);
		} catch {
			/* Storage unavailable: recovery falls back to the latest unsaved design. */
		}
		if (typeof navigator === 'undefined' || !navigator.locks) return;
		void navigator.locks.request(`sunglyph-design:${id}`, { ifAvailable: true }, (lock) => {
			if (!lock) {
				if (id === this.designId) this.otherTab = true;
				return;
			}
			return new Promise<void>((resolve) => (this.#releaseLock = resolve));
		});
	}

	/** Opens another document under the given record id (a new undo history starts). */
	#switchTo(options: { id: string; design: Design; fileName: string; unsaved: boolean }) {
		// The design put aside stays kept (and listed) but is no longer offered as recovery.
		const leaving = this.designId;
		if (this.armed && leaving !== options.id)
			void this.#saver
				.flush()
				.then(() => parkDesign(leaving))
				.catch(() => (this.failed = true));
		this.#doc.replaceDocument(options.design, options.fileName);
		this.#serial = this.#doc.documentSerial;
		this.#lastDesign = this.#doc.design;
		this.designId = options.id;
		this.unsaved = options.unsaved;
		if (this.armed) this.#keepOpenDesign();
	}

	#keepOpenDesign() {
		this.#hold(this.designId);
		this.#saver.schedule({
			id: this.designId,
			design: this.#doc.design,
			fileName: this.#doc.fileName,
			unsaved: this.unsaved
		});
	}

	/** Call on every change of the open design. */
	observe(design: Design, fileName: string, serial: number): void {
		if (serial !== this.#serial) {
			// A document swapped in from elsewhere: a design of its own.
			this.#serial = serial;
			this.#lastDesign = design;
			this.designId = newDesignId();
			this.unsaved = false;
			if (this.armed) this.#keepOpenDesign();
			return;
		}
		if (design === this.#lastDesign) return;
		this.#lastDesign = design;
		if (!this.armed) return;
		this.unsaved = true;
		this.#saver.schedule({ id: this.designId, design, fileName, unsaved: true });
	}

	flush(): Promise<void> {
		return this.#saver.flush();
	}

	async refreshRecent(): Promise<void> {
		try {
			this.recent = await listDesigns();
		} catch {
			this.failed = true;
		}
	}

	keep(): void {
		this.recovered = null;
	}

	/** Opens the demo instead of recovered work; the recovered design stays in the list. */
	setAside(): void {
		this.recovered = null;
		this.#switchTo({
			id: newDesignId(),
			design: demoDesign(),
			fileName: 'demo.sunglyph.json',
			unsaved: false
		});
	}

	newDesign(template: TemplateId, name: string): void {
		this.recovered = null;
		const design = designFromTemplate(template, name);
		this.#switchTo({
			id: newDesignId(),
			design,
			fileName: fileNameForDesign(name),
			unsaved: true
		});
	}

	/** Opens a file's bytes as a new design; on a problem the open design stays, issues listed. */
	openFile(bytes: Uint8Array, fileName: string): boolean {
		const result = readDesignBytes(bytes);
		if (!result.ok) {
			this.#doc.loadIssues = result.issues;
			this.#doc.loadSource = fileName;
			return false;
		}
		this.#doc.loadIssues = [];
		this.recovered = null;
		this.#switchTo({ id: newDesignId(), design: result.design, fileName, unsaved: false });
		return true;
	}

	openStored(item: StoredDesign): void {
		if (!item.readable) return;
		this.recovered = null;
		this.#switchTo({
			id: item.record.id,
			design: item.design,
			fileName: item.record.fileName,
			unsaved: item.record.unsaved
		});
	}

	/** A copy of the open design as a design of its own, opened in place of the original. */
	duplicate(name: string): void {
		const design = { ...this.#doc.design, name };
		this.#switchTo({
			id: newDesignId(),
			design,
			fileName: fileNameForDesign(name),
			unsaved: true
		});
	}

	rename(name: string): void {
		this.#doc.fileName = fileNameForDesign(name);
		this.#doc.replace({ ...this.#doc.design, name });
	}

	/** After the open design was written to a file. */
	markSaved(): void {
		this.unsaved = false;
		this.#saver.schedule({
			id: this.designId,
			design: this.#doc.design,
			fileName: this.#doc.fileName,
			unsaved: false
		});
	}
}
