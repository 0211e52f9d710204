/** Small line drawings for the tool buttons, 20×20 viewBox path data, drawn for sunglyph. */
import type { ToolId } from '$lib/editor/tools/tool-ids';

export const TOOL_ICONS: Record<ToolId, string> = {
	pick: 'M5 3 L5 16 L8.5 12.5 L11 18 L13 17 L10.5 11.5 L15 11.5 Z',
	points: 'M3 15 C6 4 14 4 17 15 M1.5 13.5 h3 v3 h-3 Z M15.5 13.5 h3 v3 h-3 Z M8.5 3.5 h3 v3 h-3 Z',
	turn: 'M15.5 6 A7 7 0 1 0 17 11 M15.5 2 V6 H11.5',
	size: 'M3 3 h6 v6 h-6 Z M11 11 h6 v6 h-6 Z M9 9 L11 11',
	box: 'M3 5 h14 v10 h-14 Z',
	rounded: 'M7 5 h6 a4 4 0 0 1 4 4 v2 a4 4 0 0 1 -4 4 h-6 a4 4 0 0 1 -4 -4 v-2 a4 4 0 0 1 4 -4 Z',
	oval: 'M10 4 C14.5 4 18 6.7 18 10 C18 13.3 14.5 16 10 16 C5.5 16 2 13.3 2 10 C2 6.7 5.5 4 10 4 Z',
	polygon: 'M10 2.5 L17 7.5 L14.5 16 H5.5 L3 7.5 Z',
	curve: 'M3 16 C5 6 9 4 12 9 C14 12.5 16 12 17 4 M2 15 h2 v2 h-2 Z M16 3 h2 v2 h-2 Z',
	pan: 'M6 10 V5 a1.2 1.2 0 0 1 2.4 0 V9 V3.8 a1.2 1.2 0 0 1 2.4 0 V9 V4.5 a1.2 1.2 0 0 1 2.4 0 V10 V7 a1.2 1.2 0 0 1 2.4 0 V12 c0 3.5 -2.5 6 -6 6 c-2.5 0 -4 -1.3 -5.3 -3.3 L2.6 11 a1.2 1.2 0 0 1 2 -1.3 Z'
};
