/** The drawing's per-common colours live in the core so the report and the app agree. */
export { COMMON_COLOURS, UNASSIGNED_COLOUR, commonColour } from '$lib/core/export/common-colours';
