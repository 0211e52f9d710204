/** Colours for telling commons apart on the drawing; chosen for contrast on a light ground. */
export const COMMON_COLOURS = [
	'#2f6f9f',
	'#c0602f',
	'#4d8a3a',
	'#8a4fa0',
	'#b08a1a',
	'#2a8c86',
	'#a33b5b',
	'#5a5f66'
];
export const UNASSIGNED_COLOUR = '#d33';

export function commonColour(index: number): string {
	return index < 0 ? UNASSIGNED_COLOUR : COMMON_COLOURS[index % COMMON_COLOURS.length];
}
