/** Saves text files through the browser's download mechanism, byte for byte as given. */
import type { ExportFile } from '$lib/core/export/glass-export';

export function downloadFiles(files: readonly ExportFile[]): void {
	for (const file of files) {
		const url = URL.createObjectURL(new Blob([file.content], { type: file.mime }));
		const a = document.createElement('a');
		a.href = url;
		a.download = file.name;
		document.body.appendChild(a);
		a.click();
		a.remove();
		setTimeout(() => URL.revokeObjectURL(url), 10_000);
	}
}
