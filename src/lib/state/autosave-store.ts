/**
 * The working design kept in the browser's IndexedDB (database "sunglyph", store "autosave",
 * one record "working"), so work survives a reload or a crash. The record holds the design as
 * document JSON; loading goes through the normal parser (with migrations), and a record that no
 * longer parses is ignored rather than trusted.
 */
import { openDB, type IDBPDatabase } from 'idb';
import type { Design } from '$lib/core/design/schema';
import { parseDesignText, serializeDesign } from '$lib/core/design/parse-design';

const DB_NAME = 'sunglyph';
const STORE = 'autosave';
const KEY = 'working';

export interface WorkingRecord {
	savedAt_ms: number;
	fileName: string;
	text: string;
}

export interface RecoveredWork {
	design: Design;
	fileName: string;
	savedAt: Date;
	text: string;
}

let db: Promise<IDBPDatabase> | null = null;
function database(): Promise<IDBPDatabase> {
	db ??= openDB(DB_NAME, 1, {
		upgrade(d) {
			if (!d.objectStoreNames.contains(STORE)) d.createObjectStore(STORE);
		}
	});
	return db;
}

export async function saveWorking(options: { design: Design; fileName: string }): Promise<void> {
	const record: WorkingRecord = {
		savedAt_ms: Date.now(),
		fileName: options.fileName,
		text: serializeDesign(options.design)
	};
	await (await database()).put(STORE, record, KEY);
}

export async function loadWorking(): Promise<RecoveredWork | null> {
	try {
		const record = (await (await database()).get(STORE, KEY)) as WorkingRecord | undefined;
		if (!record || typeof record.text !== 'string') return null;
		const parsed = parseDesignText(record.text);
		if (!parsed.ok) return null;
		return {
			design: parsed.design,
			fileName: typeof record.fileName === 'string' ? record.fileName : 'recovered.sunglyph.json',
			savedAt: new Date(Number(record.savedAt_ms) || Date.now()),
			text: record.text
		};
	} catch {
		return null;
	}
}

export async function clearWorking(): Promise<void> {
	try {
		await (await database()).delete(STORE, KEY);
	} catch {
		/* Storage unavailable: nothing to clear. */
	}
}
