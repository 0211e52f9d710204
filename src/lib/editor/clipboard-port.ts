/**
 * Copy and paste through the system clipboard, so electrodes travel between designs and browser
 * tabs, with an in-app copy as the fallback when the browser refuses clipboard access. The text
 * is the core's clipboard JSON payload.
 */
import { parseClipboard, type ClipboardPayload } from '$lib/core/commands/clipboard';

export interface ClipboardPort {
	write(text: string): Promise<void>;
	/** The payload to paste, preferring the system clipboard; null when neither holds one. */
	read(systemText?: string | null): Promise<ClipboardPayload | null>;
}

export class AppClipboard implements ClipboardPort {
	#inApp: string | null = null;

	async write(text: string): Promise<void> {
		this.#inApp = text;
		try {
			await navigator.clipboard?.writeText(text);
		} catch {
			/* Permission refused or no secure context: the in-app copy still pastes here. */
		}
	}

	async read(systemText?: string | null): Promise<ClipboardPayload | null> {
		let text = systemText ?? null;
		if (text === null) {
			try {
				text = (await navigator.clipboard?.readText()) ?? null;
			} catch {
				text = null;
			}
		}
		for (const candidate of [text, this.#inApp]) {
			if (!candidate) continue;
			const parsed = parseClipboard(candidate);
			if (parsed.ok) return parsed.payload;
		}
		return null;
	}
}
