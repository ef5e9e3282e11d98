/** Unit conversions used at the model's edges; the model itself works in metres. */

/** International foot, exactly. */
export const METRES_PER_FOOT = 0.3048;

export function feetToMetres(feet: number): number {
	return feet * METRES_PER_FOOT;
}

export function metresToFeet(metres: number): number {
	return metres / METRES_PER_FOOT;
}

/** Speed of sound in air, c = 331.3 · sqrt(1 + T/273.15) m/s, T in °C. */
export function speedOfSound(temperatureC: number): number {
	return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}
