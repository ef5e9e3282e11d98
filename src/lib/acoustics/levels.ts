/** Decibel summation and the two divergence laws (losses re 1 m) used by the model. */

/** Incoherent (energy) sum: 10·log10 Σ 10^(L/10). An empty list is silence, −Infinity. */
export function sumLevels(levelsDb: readonly number[]): number {
	let energy = 0;
	for (let i = 0; i < levelsDb.length; i++) energy += Math.pow(10, levelsDb[i] / 10);
	return 10 * Math.log10(energy);
}

/** Coherent, in-phase (pressure) sum: 20·log10 Σ 10^(L/20). The upper bound of real summation. */
export function sumLevelsCoherent(levelsDb: readonly number[]): number {
	let pressure = 0;
	for (let i = 0; i < levelsDb.length; i++) pressure += Math.pow(10, levelsDb[i] / 20);
	return 20 * Math.log10(pressure);
}

/** Point source, inverse square law: 20·log10(x) re 1 m (ISO 9613-2 eq. (7) less its 11 dB power-to-1 m term). */
export function pointSourceDivergenceDb(distanceM: number): number {
	return 20 * Math.log10(distanceM);
}

/**
 * Conventional line-source transition distance d_t = H²·f / (2c): inside it a straight array of
 * length H falls off at about 3 dB per doubling, beyond it at 6 dB. Published alternatives differ
 * by up to 2×, and the simple form understates the transition off the centreline.
 */
export function lineSourceTransitionM(
	lengthM: number,
	frequencyHz: number,
	speedOfSoundMPerS: number
): number {
	return (lengthM * lengthM * frequencyHz) / (2 * speedOfSoundMPerS);
}

/**
 * Divergence loss re 1 m of a line array with transition distance d_t. When d_t ≤ 1 m the array
 * behaves as a point source; otherwise 20·lg d_t + 10·lg(x/d_t) inside d_t and 20·lg x beyond it
 * (the two meet at d_t, so the curve is continuous).
 */
export function lineSourceDivergenceDb(distanceM: number, transitionM: number): number {
	if (transitionM <= 1 || distanceM >= transitionM) return 20 * Math.log10(distanceM);
	return 20 * Math.log10(transitionM) + 10 * Math.log10(distanceM / transitionM);
}
