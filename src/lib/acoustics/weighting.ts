/**
 * IEC 61672-1:2013 frequency weightings, analytic form (eqs. E.1–E.6 of Annex E):
 *   C(f) = 20·lg[f4²·f² / ((f² + f1²)(f² + f4²))] − C1000
 *   A(f) = 20·lg[f4²·f⁴ / ((f² + f1²)·√(f² + f2²)·√(f² + f3²)·(f² + f4²))] − A1000
 * with the standard's constants; A1000 and C1000 make both 0.00 dB at 1 kHz.
 */
import { BAND_COUNT, EXACT_BAND_FREQUENCIES_HZ } from './bands';
import { fail } from './errors';
import type { Weighting } from './types';

const F1 = 20.598997;
const F2 = 107.65265;
const F3 = 737.86223;
const F4 = 12194.217;
const A1000 = -2.0;
const C1000 = -0.062;

const F1_SQ = F1 * F1;
const F2_SQ = F2 * F2;
const F3_SQ = F3 * F3;
const F4_SQ = F4 * F4;

export function aWeighting(frequencyHz: number): number {
	const f2 = frequencyHz * frequencyHz;
	const gain =
		(F4_SQ * f2 * f2) / ((f2 + F1_SQ) * Math.sqrt((f2 + F2_SQ) * (f2 + F3_SQ)) * (f2 + F4_SQ));
	return 20 * Math.log10(gain) - A1000;
}

export function cWeighting(frequencyHz: number): number {
	const f2 = frequencyHz * frequencyHz;
	const gain = (F4_SQ * f2) / ((f2 + F1_SQ) * (f2 + F4_SQ));
	return 20 * Math.log10(gain) - C1000;
}

const WEIGHTINGS: readonly string[] = ['A', 'C', 'Z'];

export function isWeighting(value: unknown): value is Weighting {
	return typeof value === 'string' && WEIGHTINGS.includes(value);
}

export function assertWeighting(value: unknown, what: string): Weighting {
	if (!isWeighting(value))
		fail(`${what} has unknown weighting "${String(value)}"; use 'A', 'C' or 'Z'.`);
	return value;
}

/** Weighting in dB at a frequency; Z (zero) weighting is flat. Throws on an unknown weighting. */
export function weighting(w: Weighting, frequencyHz: number): number {
	switch (assertWeighting(w, 'weighting()')) {
		case 'A':
			return aWeighting(frequencyHz);
		case 'C':
			return cWeighting(frequencyHz);
		case 'Z':
			return 0;
	}
}

function bandTable(w: Weighting): Float64Array {
	const table = new Float64Array(BAND_COUNT);
	for (let i = 0; i < BAND_COUNT; i++) table[i] = weighting(w, EXACT_BAND_FREQUENCIES_HZ[i]);
	return table;
}

/** Each weighting at the exact octave mid-band frequencies, precomputed once for the hot path. */
export const BAND_WEIGHTINGS_DB: Readonly<Record<Weighting, Float64Array>> = {
	A: bandTable('A'),
	C: bandTable('C'),
	Z: bandTable('Z')
};
