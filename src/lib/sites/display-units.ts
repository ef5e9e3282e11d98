/** Metres inside, metres or feet on screen (1 ft = 0.3048 m exactly). Pure. */
import { fromMetres, toMetres, type DistanceUnit } from '../acoustics/units';

/** A length for display, rounded to 0.1 of the unit shown; null (an empty box) when not a number. */
export function shownLength(metres: number, units: DistanceUnit): number | null {
	if (!Number.isFinite(metres)) return null;
	const value = fromMetres(metres, units);
	return Math.round(value * 10) / 10;
}

/** A typed length back to metres; a blank or unreadable entry stays NaN for the schema to refuse. */
export function typedLength(value: number, units: DistanceUnit): number {
	return toMetres(value, units);
}
