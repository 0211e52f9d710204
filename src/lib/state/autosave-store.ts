/**
 * Designs kept in the browser's IndexedDB (database "sunglyph"): one record per design in the
 * "designs" store, keyed by the design's id, holding its document JSON, name, file name and when
 * it last changed. A record this build cannot read (a newer version, damage) is never deleted:
 * it is listed as unreadable and offered as a download. The single "working" record of earlier
 * builds (store "autosave") is moved into the designs store on first start.
 */
import { openDB, type IDBPDatabase } from 'idb';
import type { Design } from '$lib/core/design/schema';
import { parseDesignText } from '$lib/core/design/parse-design';

const DB_NAME = 'sunglyph';
const LEGACY_STORE = 'autosave';
const LEGACY_KEY = 'working';
const DESIGNS = 'designs';

export interface DesignRecord {
	id: string;
	name: string;
	fileName: string;
	text: string;
	changedAt_ms: number;
	/** True while the record holds changes not yet saved to a file. */
	unsaved: boolean;
	/** Put aside by the user (another design opened in its place): not offered as recovery. */
	parked?: boolean;
}

export type StoredDesign =
	| { readable: true; record: DesignRecord; design: Design }
	| { readable: false; record: DesignRecord; reason: string };

let db: Promise<IDBPDatabase> | null = null;
function database(): Promise<IDBPDatabase> {
	db ??= openDB(DB_NAME, 2, {
		upgrade(d) {
			if (!d.objectStoreNames.contains(LEGACY_STORE)) d.createObjectStore(LEGACY_STORE);
			if (!d.objectStoreNames.contains(DESIGNS)) d.createObjectStore(DESIGNS);
		}
	});
	return db;
}

export function newDesignId(): string {
	return typeof crypto !== 'undefined' && 'randomUUID' in crypto
		? crypto.randomUUID()
		: `d${Date.now().toString(36)}${Math.random().toString(36).slice(2)}`;
}

function asRecord(value: unknown, key: string): DesignRecord | null {
	if (typeof value !== 'object' || value === null) return null;
	const v = value as Partial<DesignRecord>;
	if (typeof v.text !== 'string') return null;
	return {
		id: key,
		name: typeof v.name === 'string' ? v.name : '(no name)',
		fileName: typeof v.fileName === 'string' ? v.fileName : 'design.sunglyph.json',
		text: v.text,
		changedAt_ms: Number.isFinite(v.changedAt_ms) ? Number(v.changedAt_ms) : 0,
		unsaved: v.unsaved === true,
		parked: v.parked === true
	};
}

function withDesign(record: DesignRecord): StoredDesign {
	const parsed = parseDesignText(record.text);
	if (parsed.ok) return { readable: true, record, design: parsed.design };
	const first = parsed.issues[0];
	return { readable: false, record, reason: `${first.path}: ${first.message}` };
}

export async function putDesign(record: DesignRecord): Promise<void> {
	await (await database()).put(DESIGNS, record, record.id);
}

export async function getDesign(id: string): Promise<StoredDesign | null> {
	const record = asRecord(await (await database()).get(DESIGNS, id), id);
	return record ? withDesign(record) : null;
}

/** Marks a kept design as put aside by the user; it stays listed, and is not deleted. */
export async function parkDesign(id: string): Promise<void> {
	const d = await database();
	const tx = d.transaction(DESIGNS, 'readwrite');
	const value = await tx.store.get(id);
	if (typeof value === 'object' && value !== null)
		await tx.store.put({ ...value, parked: true }, id);
	await tx.done;
}

/** Every kept design, most recently changed first; unreadable ones included, never dropped. */
export async function listDesigns(): Promise<StoredDesign[]> {
	const d = await database();
	const keys = (await d.getAllKeys(DESIGNS)).map(String);
	const values = await d.getAll(DESIGNS);
	const list: StoredDesign[] = [];
	values.forEach((value, i) => {
		const record = asRecord(value, keys[i]);
		if (record) list.push(withDesign(record));
	});
	return list.sort((a, b) => b.record.changedAt_ms - a.record.changedAt_ms);
}

/** Moves the earlier builds' single working record into the designs store (once). */
export async function adoptLegacyWorking(): Promise<void> {
	const d = await database();
	const legacy = (await d.get(LEGACY_STORE, LEGACY_KEY)) as
		{ savedAt_ms?: number; fileName?: string; text?: string } | undefined;
	if (!legacy || typeof legacy.text !== 'string') return;
	const parsed = parseDesignText(legacy.text);
	const record: DesignRecord = {
		id: newDesignId(),
		name: parsed.ok ? parsed.design.name : 'Recovered work',
		fileName: typeof legacy.fileName === 'string' ? legacy.fileName : 'recovered.sunglyph.json',
		text: legacy.text,
		changedAt_ms: Number(legacy.savedAt_ms) || Date.now(),
		unsaved: true
	};
	const tx = d.transaction([DESIGNS, LEGACY_STORE], 'readwrite');
	await Promise.all([
		tx.objectStore(DESIGNS).put(record, record.id),
		tx.objectStore(LEGACY_STORE).delete(LEGACY_KEY),
		tx.done
	]);
}
