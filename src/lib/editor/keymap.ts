/**
 * Keyboard chords: a chord is written like `mod+shift+z` (mod = Ctrl, or Cmd on a Mac). Letters
 * compare case-blind with shift as a modifier; for symbols (?, +, #) shift is part of producing
 * the character and is ignored. The plus key is written `plus`. `chordOf` turns a key event into the same form.
 */

export interface KeyLike {
	key: string;
	ctrlKey: boolean;
	metaKey: boolean;
	altKey: boolean;
	shiftKey: boolean;
}

const NAMED = new Set([
	'arrowleft',
	'arrowright',
	'arrowup',
	'arrowdown',
	'delete',
	'backspace',
	'enter',
	'escape',
	'tab',
	'home',
	'end',
	' '
]);

/** Normalises a chord or event to `mod+alt+shift+key` order, lower case. */
export function normaliseChord(chord: string): string {
	const parts = chord.toLowerCase().split('+');
	const key = parts.pop()!;
	const mods = new Set(parts);
	return [...['mod', 'alt', 'shift'].filter((m) => mods.has(m)), key].join('+');
}

export function chordOf(event: KeyLike): string {
	const key = event.key === '+' ? 'plus' : event.key.toLowerCase();
	const letterLike = /^[a-z0-9]$/.test(key) || NAMED.has(key) || key.startsWith('arrow');
	const mods: string[] = [];
	if (event.ctrlKey || event.metaKey) mods.push('mod');
	if (event.altKey) mods.push('alt');
	if (event.shiftKey && letterLike) mods.push('shift');
	return [...mods, key === ' ' ? 'space' : key].join('+');
}

/** Human-readable form of a chord for menus and the help overlay. */
export function describeChord(chord: string, mac = false): string {
	const names: Record<string, string> = {
		mod: mac ? '⌘' : 'Ctrl',
		alt: mac ? '⌥' : 'Alt',
		shift: 'Shift',
		arrowleft: '←',
		arrowright: '→',
		arrowup: '↑',
		arrowdown: '↓',
		delete: 'Delete',
		backspace: 'Backspace',
		escape: 'Esc',
		enter: 'Enter',
		space: 'Space',
		home: 'Home',
		end: 'End',
		plus: '+'
	};
	return normaliseChord(chord)
		.split('+')
		.map((p) => names[p] ?? (p.length === 1 ? p.toUpperCase() : p))
		.join(mac ? '' : '+');
}

/** True when typing in a text field should keep the key for itself. */
export function isTextEntryTarget(target: EventTarget | null): boolean {
	if (!target || typeof (target as HTMLElement).tagName !== 'string') return false;
	const el = target as HTMLElement;
	if (el.isContentEditable) return true;
	if (el.tagName === 'TEXTAREA' || el.tagName === 'SELECT') return true;
	if (el.tagName !== 'INPUT') return false;
	const type = (el as HTMLInputElement).type;
	return !['checkbox', 'radio', 'button', 'range', 'color', 'file'].includes(type);
}
