/**
 * The editor's tools, their plain names and their keys. Names are our own words.
 */
export type ToolId =
	'pick' | 'nodes' | 'turn' | 'size' | 'box' | 'rounded' | 'oval' | 'polygon' | 'curve' | 'pan';

export interface ToolInfo {
	id: ToolId;
	name: string;
	key: string;
	hint: string;
}

export const TOOLS: readonly ToolInfo[] = [
	{
		id: 'pick',
		name: 'Pick',
		key: 'V',
		hint: 'Click to select, shift-click to add, drag to move or to draw a selection box'
	},
	{
		id: 'nodes',
		name: 'Nodes',
		key: 'N',
		hint: 'Drag points and handles; double-click an edge to add a point; Delete removes points'
	},
	{
		id: 'turn',
		name: 'Turn',
		key: 'R',
		hint: 'Drag the round handle to rotate the selection; shift keeps 15° steps'
	},
	{
		id: 'size',
		name: 'Size',
		key: 'S',
		hint: 'Drag a square handle to resize; shift keeps proportions'
	},
	{ id: 'box', name: 'Box', key: 'B', hint: 'Drag to draw a rectangle' },
	{
		id: 'rounded',
		name: 'Rounded',
		key: 'U',
		hint: 'Drag to draw a rectangle with rounded corners'
	},
	{ id: 'oval', name: 'Oval', key: 'O', hint: 'Drag to draw an ellipse; shift for a circle' },
	{
		id: 'polygon',
		name: 'Polygon',
		key: 'G',
		hint: 'Drag from the centre to draw a regular polygon'
	},
	{
		id: 'curve',
		name: 'Curve',
		key: 'P',
		hint: 'Click for corners, drag for smooth points; click the first point or press Enter to close'
	},
	{
		id: 'pan',
		name: 'Pan',
		key: 'H',
		hint: 'Drag to pan (or hold Space, or drag with the middle button)'
	}
];

export const toolInfo = (id: ToolId): ToolInfo => TOOLS.find((t) => t.id === id) ?? TOOLS[0];
