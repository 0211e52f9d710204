/**
 * Every editable number of the cell and of the light, declared once: its label, unit, allowed
 * range and default. The design schema, the app's fields, the command line's options and their
 * help all read this list, so a limit or a default cannot differ between them.
 *
 * Values are stored in the unit of the key's suffix (µm, degrees, seconds, lux) or as a fraction;
 * `shown` gives the unit people read (% for fractions, ms for times) and its scale factor.
 * Defaults describe a typical reflective 90° TN meter cell (common practice): 5 µm gap, 2°
 * rubbed-polyimide pretilt and a small chiral dose d/p = 0.1 that fixes the twist sense.
 */
export interface QuantityField {
	/** Field name in the document. */
	key: string;
	label: string;
	/** What an error message calls it ("a cell gap"). */
	noun: string;
	/** Unit of the stored value ('' for plain numbers and fractions). */
	unit: string;
	min: number;
	max: number;
	/** True when the minimum itself is not allowed. */
	minExclusive?: boolean;
	/** True when the maximum itself is not allowed. */
	maxExclusive?: boolean;
	default: number;
	/** Long command-line option, without the dashes. */
	option: string;
	/** How people read it when that differs from the stored value. */
	shown?: { unit: string; scale: number };
	/** One line for command-line help. */
	help: string;
}

export const CELL_FIELDS = {
	gap_um: {
		key: 'gap_um',
		label: 'Gap',
		noun: 'a cell gap',
		unit: 'µm',
		min: 0.5,
		max: 50,
		default: 5,
		option: 'gap-um',
		help: 'cell gap d'
	},
	twist_deg: {
		key: 'twist_deg',
		label: 'Twist',
		noun: 'a twist',
		unit: '°',
		min: 0,
		max: 270,
		default: 90,
		option: 'twist',
		help: 'total twist of the director across the gap'
	},
	pretilt_deg: {
		key: 'pretilt_deg',
		label: 'Pretilt',
		noun: 'a pretilt',
		unit: '°',
		min: 0,
		max: 44,
		default: 2,
		option: 'pretilt-deg',
		help: 'pretilt at both plates (0 gives the textbook cell)'
	},
	gapToPitch: {
		key: 'gapToPitch',
		label: 'd/p (dopant)',
		noun: 'a chiral dose d/p',
		unit: '',
		min: -2,
		max: 2,
		default: 0.1,
		option: 'd-over-p',
		help: 'chiral dopant dose: gap over natural pitch, signed like the twist'
	},
	frontSurfaceReflectance: {
		key: 'frontSurfaceReflectance',
		label: 'Front reflection',
		noun: 'a front-surface reflectance',
		unit: '',
		min: 0,
		max: 0.5,
		default: 0.04,
		option: 'front-reflectance',
		shown: { unit: '%', scale: 100 },
		help: 'light the front surface reflects before the polarizer, as a fraction'
	},
	switchingLimit_s: {
		key: 'switchingLimit_s',
		label: 'Slow-switching limit',
		noun: 'a switching-time limit',
		unit: 's',
		min: 0.001,
		max: 60,
		default: 1,
		option: 'switching-limit-s',
		shown: { unit: 'ms', scale: 1000 },
		help: 'switching slower than this is flagged'
	}
} as const satisfies Record<string, QuantityField>;

export const LIGHTING_FIELDS = {
	illuminance_lx: {
		key: 'illuminance_lx',
		label: 'Illuminance',
		noun: 'an illuminance',
		unit: 'lx',
		min: 0.01,
		max: 200000,
		default: 500,
		option: 'illuminance-lx',
		help: 'ambient illuminance on the glass (luminances scale with it)'
	}
} as const satisfies Record<string, QuantityField>;

/** The field's range in the unit people read, e.g. "0.5 to 50 µm" or "0 to 50 %". */
export function rangeText(field: QuantityField): string {
	const scale = field.shown?.scale ?? 1;
	const unit = field.shown?.unit ?? field.unit;
	const number = (v: number) => String(Number((v * scale).toPrecision(6)));
	const sep = unit === '' || unit === '°' ? '' : ' ';
	return `${number(field.min)} to ${number(field.max)}${sep}${unit}`;
}

/** Label, unit and limits in the unit people read, for an input field. */
export function shownField(field: QuantityField) {
	const scale = field.shown?.scale ?? 1;
	return {
		label: field.label,
		unit: field.shown?.unit ?? field.unit,
		min: field.min * scale,
		max: field.max * scale,
		scale
	};
}

/** True when the value lies inside the field's range. */
export function inRange(field: QuantityField, value: number): boolean {
	if (!Number.isFinite(value)) return false;
	const aboveMin = field.minExclusive ? value > field.min : value >= field.min;
	const belowMax = field.maxExclusive ? value < field.max : value <= field.max;
	return aboveMin && belowMax;
}

/** The field's rule in plain words, as error messages and help show it. */
export function rangeRule(field: QuantityField): string {
	const limits = field.maxExclusive ? ', the maximum excluded' : '';
	return `expected ${field.noun} from ${rangeText(field)}${limits}`;
}
