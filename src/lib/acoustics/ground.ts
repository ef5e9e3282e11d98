/**
 * Ground attenuation A_gr, ISO 9613-2:1996 §7.3.1, Table 3 and eq. (9), with one ground factor G
 * for the source, middle and receiver regions (contract step 3b):
 *   A_gr = A_s(h_s) + A_r(h_r) + A_m
 *   A_s, A_r: 63 Hz −1.5; 125 Hz −1.5 + G·a′(h); 250 Hz −1.5 + G·b′(h); 500 Hz −1.5 + G·c′(h);
 *             1 kHz −1.5 + G·d′(h); 2–8 kHz −1.5·(1 − G)
 *   A_m: 63 Hz −3q, others −3q·(1 − G); q = 0 when d_p ≤ 30(h_s + h_r), else 1 − 30(h_s + h_r)/d_p
 * The 31.5 Hz band uses the 63 Hz row. Negative values are a gain (reflection from hard ground).
 * ISO 9613-2 predicts for downwind propagation, the cautious case for a limit.
 */
import { BAND_COUNT, NOMINAL_BAND_CENTRES_HZ, bandIndexOf } from './bands';
import { fail, requireFinite } from './errors';

/** The four height factors of Table 3 that do not depend on distance, for one height h. */
export interface HeightTerms {
	/** e^(−0.12(h−5)²), e^(−0.09h²), e^(−0.46h²), e^(−0.9h²) */
	a: number;
	b: number;
	c: number;
	d: number;
}

export function heightTerms(h: number, out: HeightTerms = { a: 0, b: 0, c: 0, d: 0 }): HeightTerms {
	out.a = Math.exp(-0.12 * (h - 5) * (h - 5));
	out.b = Math.exp(-0.09 * h * h);
	out.c = Math.exp(-0.46 * h * h);
	out.d = Math.exp(-0.9 * h * h);
	return out;
}

/** The distance factors of Table 3: 1 − e^(−d_p/50) and 1 − e^(−2.8·10⁻⁶·d_p²). */
export interface DistanceTerms {
	near: number;
	far: number;
}

export function distanceTerms(dpM: number, out: DistanceTerms): DistanceTerms {
	out.near = 1 - Math.exp(-dpM / 50);
	out.far = 1 - Math.exp(-2.8e-6 * dpM * dpM);
	return out;
}

/**
 * A_s or A_r for each band (index 0 … 8) added into `out`, for one region of height h.
 * a′ = 1.5 + 3.0·e^(−0.12(h−5)²)·near + 5.7·e^(−0.09h²)·far; b′ = 1.5 + 8.6·e^(−0.09h²)·near;
 * c′ = 1.5 + 14.0·e^(−0.46h²)·near; d′ = 1.5 + 5.0·e^(−0.9h²)·near.
 */
export function addRegion(h: HeightTerms, dist: DistanceTerms, G: number, out: Float64Array): void {
	out[0] += -1.5;
	out[1] += -1.5;
	out[2] += -1.5 + G * (1.5 + 3.0 * h.a * dist.near + 5.7 * h.b * dist.far);
	out[3] += -1.5 + G * (1.5 + 8.6 * h.b * dist.near);
	out[4] += -1.5 + G * (1.5 + 14.0 * h.c * dist.near);
	out[5] += -1.5 + G * (1.5 + 5.0 * h.d * dist.near);
	const high = -1.5 * (1 - G);
	out[6] += high;
	out[7] += high;
	out[8] += high;
}

/**
 * A_gr in every band added into `out` (the caller zeroes or pre-fills it), for source and receiver
 * height terms, the horizontal distance d_p and G.
 */
export function addGroundAttenuation(
	source: HeightTerms,
	receiver: HeightTerms,
	sumOfHeightsM: number,
	dpM: number,
	dist: DistanceTerms,
	G: number,
	out: Float64Array
): void {
	addRegion(source, dist, G, out);
	addRegion(receiver, dist, G, out);
	addMiddleRegion(sumOfHeightsM, dpM, G, out);
}

/** A_m in every band added into `out`: −3q at 63 Hz (and 31.5), −3q·(1 − G) above. */
export function addMiddleRegion(
	sumOfHeightsM: number,
	dpM: number,
	G: number,
	out: Float64Array
): void {
	const reach = 30 * sumOfHeightsM;
	if (dpM <= reach) return;
	const q = 1 - reach / dpM;
	out[0] += -3 * q;
	out[1] += -3 * q;
	const middle = -3 * q * (1 - G);
	for (let b = 2; b < BAND_COUNT; b++) out[b] += middle;
}

/** Checks a ground factor: a number from 0 (hard) to 1 (porous). */
export function checkGroundFactor(G: unknown, what = 'Ground factor G'): number {
	const g = requireFinite(G, what);
	if (g < 0 || g > 1) fail(`${what} must be between 0 (hard) and 1 (porous) (got ${g}).`);
	return g;
}

const ONE_POINT = new Float64Array(BAND_COUNT);
const ONE_DISTANCE: DistanceTerms = { near: 0, far: 0 };

/** Contract function: A_gr (dB) in one band; positive is a loss, negative a gain. */
export function groundAttenuation(
	bandHz: number,
	sourceHeightM: number,
	receiverHeightM: number,
	groundDistanceM: number,
	groundFactor: number
): number {
	const band = bandIndexOf(bandHz);
	if (band < 0)
		fail(
			`Band ${bandHz} Hz is not one of the model's octave bands; use ${NOMINAL_BAND_CENTRES_HZ.join(', ')}.`
		);
	const hs = requireFinite(sourceHeightM, 'Source height (m)');
	const hr = requireFinite(receiverHeightM, 'Receiver height (m)');
	const dp = requireFinite(groundDistanceM, 'Ground distance (m)');
	if (hs < 0 || hr < 0) fail(`Heights above ground cannot be negative (got ${hs} m and ${hr} m).`);
	if (dp < 0) fail(`Ground distance cannot be negative (got ${dp} m).`);
	const G = checkGroundFactor(groundFactor);
	ONE_POINT.fill(0);
	addGroundAttenuation(
		heightTerms(hs),
		heightTerms(hr),
		hs + hr,
		dp,
		distanceTerms(dp, ONE_DISTANCE),
		G,
		ONE_POINT
	);
	return ONE_POINT[band];
}
