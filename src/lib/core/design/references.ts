/**
 * Cross-reference rules the schema alone cannot express: unique ids, and assignments and group
 * members that point at things which exist.
 */
import type { Design } from './schema';
import type { DesignIssue } from './issues';
import { LC_PRESETS, presetById } from '../lc/presets';

function duplicateIds(
	items: readonly { id: string }[],
	listName: string,
	issues: DesignIssue[]
): Set<string> {
	const seen = new Set<string>();
	items.forEach((item, index) => {
		if (seen.has(item.id)) {
			issues.push({ path: `${listName}[${index}].id`, message: `duplicate id "${item.id}"` });
		}
		seen.add(item.id);
	});
	return seen;
}

export function checkReferences(design: Design): DesignIssue[] {
	const issues: DesignIssue[] = [];
	const commons = duplicateIds(design.commons, 'commons', issues);
	const lines = duplicateIds(design.segmentLines, 'segmentLines', issues);
	const electrodes = duplicateIds(design.electrodes, 'electrodes', issues);
	duplicateIds(design.groups, 'groups', issues);
	design.electrodes.forEach((electrode, index) => {
		if (electrode.common !== null && !commons.has(electrode.common)) {
			issues.push({
				path: `electrodes[${index}].common`,
				message: `unknown common "${electrode.common}"`
			});
		}
		if (electrode.line !== null && !lines.has(electrode.line)) {
			issues.push({
				path: `electrodes[${index}].line`,
				message: `unknown segment line "${electrode.line}"`
			});
		}
	});
	design.groups.forEach((group, groupIndex) => {
		group.members.forEach((member, memberIndex) => {
			if (!electrodes.has(member)) {
				issues.push({
					path: `groups[${groupIndex}].members[${memberIndex}]`,
					message: `unknown electrode "${member}"`
				});
			}
		});
	});
	if ('preset' in design.cell.material && !presetById(design.cell.material.preset)) {
		issues.push({
			path: 'cell.material.preset',
			message: `unknown preset "${design.cell.material.preset}" (known: ${LC_PRESETS.map((m) => m.id).join(', ')})`
		});
	}
	return issues;
}
