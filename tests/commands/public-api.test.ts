/**
 * Pins the public API that the editor imports by path: renaming or removing one of these is a
 * breaking change for src/lib/editor and must show up here first.
 */
import { describe, expect, it } from 'vitest';
import * as m0 from '../../src/lib/core/commands/patch';
import * as m1 from '../../src/lib/core/commands/patch-algebra';
import * as m2 from '../../src/lib/core/commands/diff-design';
import * as m3 from '../../src/lib/core/commands/design-draft';
import * as m4 from '../../src/lib/core/commands/history';
import * as m5 from '../../src/lib/core/commands/gesture';
import * as m6 from '../../src/lib/core/commands/ids';
import * as m7 from '../../src/lib/core/commands/selection';
import * as m8 from '../../src/lib/core/commands/add-electrodes';
import * as m9 from '../../src/lib/core/commands/delete-electrodes';
import * as m10 from '../../src/lib/core/commands/set-electrode-properties';
import * as m11 from '../../src/lib/core/commands/assign-electrodes';
import * as m12 from '../../src/lib/core/commands/line-refs';
import * as m13 from '../../src/lib/core/commands/move-electrodes';
import * as m14 from '../../src/lib/core/commands/rotate-electrodes';
import * as m15 from '../../src/lib/core/commands/scale-electrodes';
import * as m16 from '../../src/lib/core/commands/mirror-electrodes';
import * as m17 from '../../src/lib/core/commands/transform-electrodes';
import * as m18 from '../../src/lib/core/commands/set-selection-bounds';
import * as m19 from '../../src/lib/core/commands/move-point';
import * as m20 from '../../src/lib/core/commands/move-handle';
import * as m21 from '../../src/lib/core/commands/insert-point';
import * as m22 from '../../src/lib/core/commands/delete-point';
import * as m23 from '../../src/lib/core/commands/toggle-point-smooth';
import * as m24 from '../../src/lib/core/commands/duplicate-electrodes';
import * as m25 from '../../src/lib/core/commands/array-electrodes';
import * as m26 from '../../src/lib/core/commands/align-electrodes';
import * as m27 from '../../src/lib/core/commands/distribute-electrodes';
import * as m28 from '../../src/lib/core/commands/group-electrodes';
import * as m29 from '../../src/lib/core/commands/reorder-electrodes';
import * as m30 from '../../src/lib/core/commands/boolean-electrodes';
import * as m31 from '../../src/lib/core/commands/clipboard';
import * as m32 from '../../src/lib/core/commands/paste-clipboard';
import * as m33 from '../../src/lib/core/commands/insert-generated';
import * as m34 from '../../src/lib/core/commands/regenerate-group';
import * as m35 from '../../src/lib/core/geometry/snap';
import * as m36 from '../../src/lib/core/geometry/snap-candidates';
import * as m37 from '../../src/lib/core/geometry/spatial-index';
import * as m38 from '../../src/lib/core/geometry/hit-test';
import * as m39 from '../../src/lib/core/geometry/distance';
import * as m40 from '../../src/lib/core/geometry/primitive-shapes';
import * as m41 from '../../src/lib/core/geometry/tight-bounds';
import * as m42 from '../../src/lib/core/geometry/path-data';
import * as m43 from '../../src/lib/core/geometry/bounds';
import * as m44 from '../../src/lib/core/glyphs/generator-registry';
import * as m45 from '../../src/lib/core/glyphs/icons/icon-library';
import * as m46 from '../../src/lib/core/glyphs/text-layout';
import * as m47 from '../../src/lib/core/glyphs/seven-segment';

const API: [string, Record<string, unknown>, string[]][] = [
	[
		'commands/patch',
		m0,
		['applyPatch', 'COLLECTIONS', 'DOCUMENT_FIELDS', 'EMPTY_PATCH', 'PatchConflictError']
	],
	[
		'commands/patch-algebra',
		m1,
		['invertPatch', 'squashPatches', 'isNoopPatch', 'insertedIds', 'removedIds']
	],
	['commands/diff-design', m2, ['diffDesigns', 'diffRecordLists']],
	['commands/design-draft', m3, ['DesignDraft', 'editDesign']],
	['commands/history', m4, ['History']],
	['commands/gesture', m5, ['Gesture', 'beginGesture']],
	['commands/ids', m6, ['IdAllocator', 'nextId']],
	['commands/selection', m7, ['selectedElectrodes', 'selectionBounds', 'selectionUnits']],
	['commands/add-electrodes', m8, ['addElectrodes']],
	['commands/delete-electrodes', m9, ['deleteElectrodes']],
	['commands/set-electrode-properties', m10, ['setElectrodeProperties']],
	['commands/assign-electrodes', m11, ['assignElectrodes']],
	['commands/line-refs', m12, ['addLineRef', 'renameLineRef', 'deleteLineRef']],
	['commands/move-electrodes', m13, ['moveElectrodes']],
	['commands/rotate-electrodes', m14, ['rotateElectrodes']],
	['commands/scale-electrodes', m15, ['scaleElectrodes']],
	['commands/mirror-electrodes', m16, ['mirrorElectrodes']],
	['commands/transform-electrodes', m17, ['transformElectrodes']],
	['commands/set-selection-bounds', m18, ['setSelectionBounds']],
	['commands/move-point', m19, ['movePoint']],
	['commands/move-handle', m20, ['moveHandle']],
	['commands/insert-point', m21, ['insertPoint']],
	['commands/delete-point', m22, ['deletePoint']],
	['commands/toggle-point-smooth', m23, ['togglePointSmooth']],
	['commands/duplicate-electrodes', m24, ['duplicateElectrodes']],
	['commands/array-electrodes', m25, ['linearArray', 'gridArray']],
	['commands/align-electrodes', m26, ['alignElectrodes']],
	['commands/distribute-electrodes', m27, ['distributeElectrodes']],
	['commands/group-electrodes', m28, ['groupElectrodes', 'ungroupElectrodes', 'renameGroup']],
	['commands/reorder-electrodes', m29, ['reorderElectrodes']],
	['commands/boolean-electrodes', m30, ['booleanElectrodes']],
	[
		'commands/clipboard',
		m31,
		['copySelection', 'serializeClipboard', 'parseClipboard', 'clipboardSchema']
	],
	['commands/paste-clipboard', m32, ['pasteClipboard']],
	['commands/insert-generated', m33, ['insertGenerated']],
	['commands/regenerate-group', m34, ['regenerateGroup']],
	['geometry/snap', m35, ['snapPoint']],
	['geometry/snap-candidates', m36, ['snapCandidatesNear']],
	['geometry/spatial-index', m37, ['buildSpatialIndex']],
	['geometry/hit-test', m38, ['hitTest', 'hitTestAll', 'queryRect']],
	['geometry/distance', m39, ['nearestPointOnContour', 'distancePointToSegment']],
	[
		'geometry/primitive-shapes',
		m40,
		[
			'rectangleContour',
			'roundedRectangleContour',
			'ellipseContour',
			'regularPolygonContour',
			'penPathContour'
		]
	],
	['geometry/tight-bounds', m41, ['contourTightBounds', 'shapesTightBounds', 'shapeTightBounds']],
	['geometry/path-data', m42, ['contourToPathData', 'shapeToPathData']],
	['geometry/bounds', m43, ['contourBounds', 'unionBounds', 'EMPTY_BOUNDS']],
	['glyphs/generator-registry', m44, ['runGenerator', 'GENERATORS', 'GENERATOR_KINDS']],
	['glyphs/icons/icon-library', m45, ['ICONS', 'iconById', 'searchIcons', 'generateIcon']],
	['glyphs/text-layout', m46, ['layoutText']],
	[
		'glyphs/seven-segment',
		m47,
		['generateSevenSegment', 'sevenSegmentDigit', 'SEVEN_SEGMENT_NAMES']
	]
];

describe('public API', () => {
	it.each(API)('%s exports its functions', (path, module, names) => {
		for (const name of names) expect(module[name], `${path}.${name}`).toBeDefined();
	});
});
