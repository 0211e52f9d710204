/**
 * Migration hook for design documents: each step lifts a raw document from version n to n + 1.
 * Loading a file runs every step from its version up to DESIGN_VERSION, on a copy, before the
 * schema sees it. A newer file than this build understands is refused, never guessed at.
 */
import { DESIGN_FORMAT, DESIGN_VERSION } from './schema';
import { DEFAULT_CELL, DEFAULT_LIGHTING } from './cell-schema';
import { DEFAULT_PINOUT, DEFAULT_RULES } from './rules-schema';
import { addLegibilitySection } from './legibility-schema';
import { addOrientation } from './orientation-migration';
import { plainCopy } from './plain-copy';
import { addGlassArt } from './glass-art-schema';

export type RawDocument = Record<string, unknown>;
/** migrations[n] lifts a version-n document to version n + 1. */
export type MigrationTable = Readonly<Record<number, (doc: RawDocument) => RawDocument>>;

export const DESIGN_MIGRATIONS: MigrationTable = {
	/** Version 2 adds the cell (fluid, stack, reflector) and the ambient light, with defaults. */
	1: (doc) => ({
		...doc,
		cell: doc.cell ?? JSON.parse(JSON.stringify(DEFAULT_CELL)),
		lighting: doc.lighting ?? { ...DEFAULT_LIGHTING }
	}),
	/** Version 3 adds the design-rule limits and the pin-out; assignments start unlocked. */
	2: (doc) => ({
		...doc,
		rules: doc.rules ?? { ...DEFAULT_RULES },
		pinout: doc.pinout ?? { ...DEFAULT_PINOUT },
		electrodes: Array.isArray(doc.electrodes)
			? doc.electrodes.map((e: unknown) =>
					typeof e === 'object' && e !== null && !Array.isArray(e) ? { locked: false, ...e } : e
				)
			: doc.electrodes
	}),
	/** Version 4 adds the light scenarios, readers and reading preview (legibility). */
	3: addLegibilitySection,
	/** Version 5 adds the cell orientation: rubbing directions, twist sense, rear glass. */
	4: addOrientation,
	/** Version 6 adds the glass drawing: seal, ledge, overlap margin, transfer points, traces. */
	5: addGlassArt
};

export type MigrationResult =
	{ ok: true; document: RawDocument; from: number } | { ok: false; path: string; message: string };

export function migrateDocument(
	raw: unknown,
	options: { migrations?: MigrationTable; targetVersion?: number } = {}
): MigrationResult {
	const migrations = options.migrations ?? DESIGN_MIGRATIONS;
	const target = options.targetVersion ?? DESIGN_VERSION;
	if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
		return { ok: false, path: '(root)', message: 'expected a JSON object' };
	}
	const doc = raw as RawDocument;
	if (doc.format !== DESIGN_FORMAT) {
		return { ok: false, path: 'format', message: `expected "${DESIGN_FORMAT}"` };
	}
	const from = doc.version;
	if (typeof from !== 'number' || !Number.isInteger(from) || from < 1) {
		return { ok: false, path: 'version', message: 'expected a whole version number of at least 1' };
	}
	if (from > target) {
		return {
			ok: false,
			path: 'version',
			message: `version ${from} is newer than this build understands (${target}); update sunglyph`
		};
	}
	const copied = plainCopy(doc);
	if (!copied.ok) return copied;
	let current = copied.value as RawDocument;
	for (let version = from; version < target; version++) {
		const step = migrations[version];
		if (!step) {
			return { ok: false, path: 'version', message: `no migration from version ${version}` };
		}
		current = { ...step(current), version: version + 1 };
	}
	return { ok: true, document: current, from };
}
