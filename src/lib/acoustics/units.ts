/** Unit conversions used at the model's edges; the model itself works in metres. */

/** International foot, exactly. */
export const METRES_PER_FOOT = 0.3048;

export function feetToMetres(feet: number): number {
	return feet * METRES_PER_FOOT;
}

export function metresToFeet(metres: number): number {
	return metres / METRES_PER_FOOT;
}

/** The unit a distance is entered and shown in. */
export type DistanceUnit = 'm' | 'ft';

/** A distance entered in `unit`, in metres. */
export function toMetres(value: number, unit: DistanceUnit): number {
	return unit === 'ft' ? feetToMetres(value) : value;
}

/** A distance in metres, in `unit`. */
export function fromMetres(metres: number, unit: DistanceUnit): number {
	return unit === 'ft' ? metresToFeet(metres) : metres;
}

/** Speed of sound in air, c = 331.3 · sqrt(1 + T/273.15) m/s, T in °C. */
export function speedOfSound(temperatureC: number): number {
	return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}
