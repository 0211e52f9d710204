/** One instance of every tool, keyed by id; the Pan tool only sets the cursor (the canvas pans). */
import type { Tool } from './tool';
import type { ToolId } from './tool-ids';
import { PickTool } from './pick-tool';
import { PointsTool } from './points-tool';
import { TurnTool } from './turn-tool';
import { SizeTool } from './size-tool';
import { ShapeTool } from './shape-tool';
import { CurveTool } from './curve-tool';

const panTool: Tool = {
	id: 'pan',
	state: 'idle',
	cursor: 'grab',
	pointer: () => {},
	key: () => false,
	cancel: () => {}
};

export function createTools(): Record<ToolId, Tool> {
	return {
		pick: new PickTool(),
		points: new PointsTool(),
		turn: new TurnTool(),
		size: new SizeTool(),
		box: new ShapeTool('box'),
		rounded: new ShapeTool('rounded'),
		oval: new ShapeTool('oval'),
		polygon: new ShapeTool('polygon'),
		curve: new CurveTool(),
		pan: panTool
	};
}
