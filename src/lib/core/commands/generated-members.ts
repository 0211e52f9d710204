/**
 * Naming rule that ties a generated group's electrodes to the generator's parts: member ids are
 * `<group id>.<part key>` (e.g. `digit2.g`, `text1.c0.dp`). Regeneration uses it to keep ids,
 * names and wiring of parts that still exist; copies keep it by renaming members with their group.
 */
export const memberIdFor = (groupId: string, partKey: string): string => `${groupId}.${partKey}`;

/** The part key of a member that follows the rule, else null. */
export function partKeyOfMember(groupId: string, memberId: string): string | null {
	const prefix = `${groupId}.`;
	return memberId.startsWith(prefix) && memberId.length > prefix.length
		? memberId.slice(prefix.length)
		: null;
}
