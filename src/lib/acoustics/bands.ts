/**
 * Octave bands (IEC 61260-1). Results are labelled with the nominal centres a reader expects
 * (31.5 … 8000 Hz); every computation uses the exact base-10 mid-band frequency
 * f = 1000 · 10^(3k/10), k = −5 … 3, because that is how IEC 61672-1 Table 3 and ISO 9613-1/-2
 * tables were computed (the A-weighting at nominal 125 Hz is −16.19 dB, the standard prints −16.1).
 */

export const NOMINAL_BAND_CENTRES_HZ = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

export type NominalBandHz = (typeof NOMINAL_BAND_CENTRES_HZ)[number];

export const BAND_COUNT = NOMINAL_BAND_CENTRES_HZ.length;

/** Exact base-10 mid-band frequency of octave band k relative to 1 kHz. */
export function exactOctaveFrequencyHz(k: number): number {
	return 1000 * Math.pow(10, (3 * k) / 10);
}

/** Exact mid-band frequencies, index-aligned with NOMINAL_BAND_CENTRES_HZ (31.62 … 7943 Hz). */
export const EXACT_BAND_FREQUENCIES_HZ: readonly number[] = Object.freeze(
	NOMINAL_BAND_CENTRES_HZ.map((_, i) => exactOctaveFrequencyHz(i - 5))
);

/** Index of a nominal centre in the band arrays, or −1 when it is not one of the nine. */
export function bandIndexOf(nominalHz: number): number {
	return (NOMINAL_BAND_CENTRES_HZ as readonly number[]).indexOf(nominalHz);
}
