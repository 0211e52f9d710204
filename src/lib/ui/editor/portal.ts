/**
 * Moves an element to the end of <body> while it exists, for overlays that must cover the whole
 * window although their component sits inside the contained workspace.
 */
export function portal(node: HTMLElement): { destroy(): void } {
	document.body.appendChild(node);
	return { destroy: () => node.remove() };
}
