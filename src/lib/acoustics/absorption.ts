/**
 * Atmospheric absorption, ISO 9613-1:1993 eqs. (3)–(5) with the molar concentration of water
 * vapour from Annex B (eqs. B.1–B.3). Returns the pure-tone attenuation coefficient α in dB per metre
 * (the standard tabulates dB/km). The tables of ISO 9613-1 (Table 1) and ISO 9613-2 (Table 2) were
 * computed at exact mid-band frequencies, so callers should pass those, as evaluatePackage does.
 */
import { BAND_COUNT, EXACT_BAND_FREQUENCIES_HZ } from './bands';
import { fail, requireFinite } from './errors';
import { speedOfSound } from './units';
import type { Air } from './types';

/** Reference ambient pressure p_r, kPa. */
export const REFERENCE_PRESSURE_KPA = 101.325;
/** Reference air temperature T_0, K (20 °C). */
const T0_K = 293.15;
/** Triple-point isotherm temperature T_01, K. */
const T01_K = 273.16;
const CELSIUS_TO_KELVIN = 273.15;

/** Checks an Air value and fills the default pressure; throws a message the user can act on. */
export function normaliseAir(air: Air): Required<Air> {
	if (air === null || typeof air !== 'object')
		fail('Air conditions are missing: give temperatureC and humidityPct.');
	const temperatureC = requireFinite(air.temperatureC, 'Air temperature (°C)');
	if (temperatureC <= -CELSIUS_TO_KELVIN)
		fail(`Air temperature ${temperatureC} °C is below absolute zero.`);
	const humidityPct = requireFinite(air.humidityPct, 'Relative humidity (%)');
	if (humidityPct < 0 || humidityPct > 100)
		fail(`Relative humidity must be between 0 and 100 % (got ${humidityPct}).`);
	const pressureKPa =
		air.pressureKPa === undefined
			? REFERENCE_PRESSURE_KPA
			: requireFinite(air.pressureKPa, 'Air pressure (kPa)');
	if (pressureKPa <= 0) fail(`Air pressure must be greater than zero (got ${pressureKPa} kPa).`);
	return { temperatureC, humidityPct, pressureKPa };
}

/** α in dB/m for a pure tone at frequencyHz in the given air. */
export function airAbsorption(frequencyHz: number, air: Air): number {
	const { temperatureC, humidityPct, pressureKPa } = normaliseAir(air);
	if (!(frequencyHz > 0) || !Number.isFinite(frequencyHz))
		fail(`Frequency must be a positive finite number (got ${frequencyHz} Hz).`);
	const T = temperatureC + CELSIUS_TO_KELVIN;
	const pRel = pressureKPa / REFERENCE_PRESSURE_KPA;
	const tRel = T / T0_K;

	// Annex B: saturation vapour pressure ratio, then molar concentration h in percent.
	const saturationExponent = -6.8346 * Math.pow(T01_K / T, 1.261) + 4.6151;
	const h = (humidityPct * Math.pow(10, saturationExponent)) / pRel;

	// Eqs. (3) and (4): relaxation frequencies of oxygen and nitrogen.
	const frO = pRel * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h));
	const frN =
		pRel * Math.pow(tRel, -0.5) * (9 + 280 * h * Math.exp(-4.17 * (Math.pow(tRel, -1 / 3) - 1)));

	// Eq. (5): classical + rotational term plus the two vibrational relaxation terms.
	const f2 = frequencyHz * frequencyHz;
	return (
		8.686 *
		f2 *
		(1.84e-11 * (1 / pRel) * Math.sqrt(tRel) +
			Math.pow(tRel, -2.5) *
				((0.01275 * Math.exp(-2239.1 / T)) / (frO + f2 / frO) +
					(0.1068 * Math.exp(-3352.0 / T)) / (frN + f2 / frN)))
	);
}

/** What the model needs from the air: α per band (dB/m) and 1/c (s/m). Shared: do not mutate. */
export interface AirConstants {
	alphas: Float64Array;
	inverseC: number;
}

// One-entry cache: a quote evaluates every package (and a map every point) under the same air, so
// the nine band coefficients are computed, and the air checked, once per change of weather.
let cachedTemperatureC = Number.NaN;
let cachedHumidityPct = Number.NaN;
let cachedPressureKPa = Number.NaN;
let cached: AirConstants = { alphas: new Float64Array(BAND_COUNT), inverseC: Number.NaN };

/**
 * α at each exact octave mid-band frequency and 1/c for this air, checked (throws on impossible
 * air) the first time these values are seen. The result is shared: do not mutate it.
 */
export function airConstants(air: Air): AirConstants {
	if (air !== null && typeof air === 'object') {
		const pressureKPa = air.pressureKPa ?? REFERENCE_PRESSURE_KPA;
		if (
			air.temperatureC === cachedTemperatureC &&
			air.humidityPct === cachedHumidityPct &&
			pressureKPa === cachedPressureKPa
		)
			return cached;
	}
	const checked = normaliseAir(air);
	const alphas = new Float64Array(BAND_COUNT);
	for (let i = 0; i < BAND_COUNT; i++)
		alphas[i] = airAbsorption(EXACT_BAND_FREQUENCIES_HZ[i], checked);
	cached = { alphas, inverseC: 1 / speedOfSound(checked.temperatureC) };
	cachedTemperatureC = checked.temperatureC;
	cachedHumidityPct = checked.humidityPct;
	cachedPressureKPa = checked.pressureKPa;
	return cached;
}

/** α (dB/m) at each exact octave mid-band frequency. The returned array is shared: do not mutate it. */
export function bandAbsorption(air: Air): Float64Array {
	return airConstants(air).alphas;
}
