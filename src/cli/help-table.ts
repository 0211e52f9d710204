/** Option lists for `--help`: flags in one column, descriptions aligned beside them. */
import { rangeText, type QuantityField } from '../lib/core/design/cell-fields';

export interface HelpRow {
	flag: string;
	text: string;
	/** Shown as "(default …)" after the text. */
	default?: string;
}

const LINE_WIDTH = 100;

/** Width of the flag column that fits every row of the given groups. */
export function flagWidth(...groups: (readonly HelpRow[])[]): number {
	return Math.max(...groups.flat().map((r) => r.flag.length)) + 2;
}

/** Rows with aligned descriptions, wrapped under their own column at 100 characters. */
export function helpRows(rows: readonly HelpRow[], width = flagWidth(rows)): string {
	const indent = ' '.repeat(2 + width);
	return rows
		.map((r) => {
			const text = r.default === undefined ? r.text : `${r.text} (default ${r.default})`;
			const lines: string[] = [];
			let line = `  ${r.flag.padEnd(width)}`;
			for (const word of text.split(' ')) {
				if (line.length + word.length > LINE_WIDTH && line.trim() !== r.flag) {
					lines.push(line.trimEnd());
					line = indent;
				}
				line += `${word} `;
			}
			lines.push(line.trimEnd());
			return lines.join('\n');
		})
		.join('\n');
}

/** The help row of a declared quantity: its option, meaning, range and default. */
export function quantityRow(field: QuantityField, value = 'X'): HelpRow {
	const unit = field.unit === '°' || field.unit === '' ? field.unit : ` ${field.unit}`;
	return {
		flag: `--${field.option} ${value}`,
		text: `${field.help}, ${rangeText({ ...field, shown: undefined })}`,
		default: `${field.default}${unit}`
	};
}
