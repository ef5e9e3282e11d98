/**
 * Lengths on the plan: the site is kept in metres, shown in metres or feet. The conversion is the
 * model's own (1 ft = 0.3048 m exactly), used only here at the edge.
 */
import { fromMetres, toMetres, type DistanceUnit } from '../acoustics/units';

export function toDisplayLength(metres: number, units: DistanceUnit): number {
	return fromMetres(metres, units);
}

export function fromDisplayLength(value: number, units: DistanceUnit): number {
	return toMetres(value, units);
}

/** A length for a table cell or label: whole units from 100 up, one decimal below. */
export function formatLength(metres: number, units: DistanceUnit): string {
	const value = toDisplayLength(metres, units);
	const digits = Math.abs(value) >= 100 ? 0 : 1;
	return `${value.toFixed(digits).replace(/^-(0\.?0*)$/, '$1')} ${units}`;
}

/** A length as an input's value (no unit), one decimal, so typing it back changes nothing visible. */
export function lengthInputValue(metres: number, units: DistanceUnit): string {
	return (Math.round(toDisplayLength(metres, units) * 10) / 10 + 0).toString();
}

export function formatBearing(deg: number): string {
	return `${Math.round(deg) % 360}°`;
}
