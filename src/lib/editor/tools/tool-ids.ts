/**
 * The editor's tools, their plain names and their keys. Names are our own words. Keys follow the
 * rail: the digits 1–9 pick the tools in the order the rail shows them (the number is printed on
 * each button); panning has no tool key — hold Space or drag with the middle button.
 */
export type ToolId =
	'pick' | 'points' | 'turn' | 'size' | 'box' | 'rounded' | 'oval' | 'polygon' | 'curve' | 'pan';

export interface ToolInfo {
	id: ToolId;
	name: string;
	/** Key that picks the tool (its place on the rail); empty for none. */
	key: string;
	hint: string;
}

export const TOOLS: readonly ToolInfo[] = [
	{
		id: 'pick',
		name: 'Pick',
		key: '1',
		hint: 'Click to select, shift-click to add, drag to move or to draw a selection box'
	},
	{
		id: 'points',
		name: 'Points',
		key: '2',
		hint: 'Drag points and handles; double-click an edge to add a point; Delete removes points; with plates shown, click a trace to edit it'
	},
	{
		id: 'turn',
		name: 'Turn',
		key: '3',
		hint: 'Drag the round handle to rotate the selection; shift keeps 15° steps'
	},
	{
		id: 'size',
		name: 'Size',
		key: '4',
		hint: 'Drag a square handle to resize; shift keeps proportions'
	},
	{ id: 'box', name: 'Box', key: '5', hint: 'Drag to draw a rectangle' },
	{
		id: 'rounded',
		name: 'Rounded',
		key: '6',
		hint: 'Drag to draw a rectangle with rounded corners'
	},
	{ id: 'oval', name: 'Oval', key: '7', hint: 'Drag to draw an ellipse; shift for a circle' },
	{
		id: 'polygon',
		name: 'Polygon',
		key: '8',
		hint: 'Drag from the centre to draw a regular polygon'
	},
	{
		id: 'curve',
		name: 'Curve',
		key: '9',
		hint: 'Click for corners, drag for smooth points; click the first point or press Enter to close'
	},
	{
		id: 'pan',
		name: 'Pan',
		key: '',
		hint: 'Drag to pan; anywhere, hold Space or drag with the middle button'
	}
];

export const toolInfo = (id: ToolId): ToolInfo => TOOLS.find((t) => t.id === id) ?? TOOLS[0];
