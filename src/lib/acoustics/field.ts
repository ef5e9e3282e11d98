/**
 * The package's sound field at one point (contract steps 3 and 3b), the hot loop of the model.
 * Per band, the energy sum over the groups covering it of
 *   E1m_g,b · spreading_g,b(r_g) · 10^(−(α_b·(r_g − r_ref) + D_g,b(φ) + A_gr,g,b)/10)
 * and the band level is 10·lg E_b − α_b·r_ref. Spreading is algebraic in linear energy (1/r² for a
 * point source; 1/(d_t·r) inside a line array's transition), so the loop needs no logarithm, and one
 * exponential per group and band only where the site adds attenuation. Taking α·r_ref out of the sum
 * (r_ref = the horizontal distance, never above any r_g) keeps a covered band finite at any range.
 * Scratch arrays are module-level: the model is synchronous, so no call can interleave.
 */
import { BAND_COUNT } from './bands';
import { fillDirectivity } from './directivity';
import {
	addMiddleRegion,
	addRegion,
	distanceTerms,
	heightTerms,
	type DistanceTerms,
	type HeightTerms
} from './ground';
import type { PreparedGroup } from './groups';

/** What the air and the site make of every point of one evaluation. */
export interface Environment {
	/** α_b in dB/m at the exact band frequencies. */
	alphas: Float64Array;
	/** 1 / speed of sound (s/m), for the line-array transitions. */
	inverseC: number;
	/** No site: step 3 alone (free field, on axis, group heights ignored). */
	freeField: boolean;
	/** ISO 9613-2 G, or null for no ground term. */
	groundFactor: number | null;
}

/** dB → natural-log factor: 10^(−a/10) = e^(a·NEG_DB). */
const NEG_DB = -Math.LN10 / 10;

const attenuation = new Float64Array(BAND_COUNT);
const factors = new Float64Array(BAND_COUNT);
/** A_r of the point's own region: the same for every group, so worked out once per point. */
const receiverRegion = new Float64Array(BAND_COUNT);
const distance: DistanceTerms = { near: 0, far: 0 };
/** Height terms of the last few point heights (a site has few: the position, receivers, grid). */
const HEIGHT_SLOTS = 4;
const slotHeights = new Float64Array(HEIGHT_SLOTS).fill(Number.NaN);
const slotTerms: HeightTerms[] = Array.from({ length: HEIGHT_SLOTS }, () => heightTerms(0));
let nextSlot = 0;

function termsAtHeight(h: number): HeightTerms {
	for (let i = 0; i < HEIGHT_SLOTS; i++) if (slotHeights[i] === h) return slotTerms[i];
	const slot = nextSlot;
	nextSlot = (nextSlot + 1) % HEIGHT_SLOTS;
	slotHeights[slot] = h;
	return heightTerms(h, slotTerms[slot]);
}

/**
 * Fills continuousOut (and peakOut, contributionsOut when given) with the energy sums at a point
 * at horizontal distance dpM, off-axis angle phiDeg and height hM; returns r_ref. With a free-field
 * environment only dpM is used. contributionsOut[j·9 + b] receives group j's factor in band b
 * (E1m · factor is its energy), for naming the group that binds. absorbAll (with a site) puts all
 * the air absorption inside the sums (r_ref = 0), which spares the caller one exponential per band
 * at the cost of range: beyond roughly 3000 dB of absorption (some 15–40 km at 8 kHz) a band's
 * energy underflows to silence. onlyBand ≥ 0 (with a site) works out the losses of that band alone;
 * the other bands' sums are then not meaningful.
 */
export function fillEnergy(
	groups: readonly PreparedGroup[],
	env: Environment,
	dpM: number,
	phiDeg: number,
	hM: number,
	continuousOut: Float64Array,
	peakOut: Float64Array | null,
	contributionsOut: Float64Array | null,
	absorbAll = false,
	onlyBand = -1
): number {
	const site = !env.freeField;
	const rRef = site && absorbAll ? 0 : dpM < 1 ? 1 : dpM;
	const alphas = env.alphas;
	const inverseC = env.inverseC;
	const G = env.groundFactor;
	const ground = site && G !== null;
	// A_r of the point's own region, or zeros when there is no ground term.
	for (let b = 0; b < BAND_COUNT; b++) receiverRegion[b] = 0;
	if (ground) {
		distanceTerms(dpM, distance);
		addRegion(termsAtHeight(hM), distance, G as number, receiverRegion);
	}
	for (let b = 0; b < BAND_COUNT; b++) continuousOut[b] = 0;
	if (peakOut !== null) for (let b = 0; b < BAND_COUNT; b++) peakOut[b] = 0;
	for (let j = 0; j < groups.length; j++) {
		const g = groups[j];
		const covers = g.covers;
		let r = rRef;
		if (site) {
			const dh = hM - g.heightM;
			r = Math.sqrt(dpM * dpM + dh * dh);
			if (r < 1) r = 1;
		}
		// Spreading: 1/r², or 1/(d_t·r) inside a line array's transition.
		const inverseSquare = 1 / (r * r);
		if (g.isLineArray) {
			const transitionTimesC = g.transitionTimesC;
			for (let b = 0; b < BAND_COUNT; b++) {
				const transitionM = transitionTimesC[b] * inverseC;
				factors[b] = transitionM > 1 && r < transitionM ? 1 / (transitionM * r) : inverseSquare;
			}
		} else {
			for (let b = 0; b < BAND_COUNT; b++) factors[b] = inverseSquare;
		}
		// Site losses: extra air absorption over r − r_ref, directivity and ground, in one exponential.
		if (site) {
			fillDirectivity(g.directivity, phiDeg, attenuation);
			if (ground) {
				addRegion(g.groundTerms, distance, G as number, attenuation);
				addMiddleRegion(g.heightM + hM, dpM, G as number, attenuation);
			}
			const extra = r - rRef;
			// Neighbouring bands often share a loss (equal ground rows, the rear limit): reuse the factor.
			let lastLossDb = 0;
			let lastFactor = 1;
			for (let b = 0; b < BAND_COUNT; b++) {
				if (covers[b] === 0 || (onlyBand >= 0 && b !== onlyBand)) continue;
				const lossDb = alphas[b] * extra + attenuation[b] + receiverRegion[b];
				if (lossDb !== lastLossDb) {
					lastLossDb = lossDb;
					lastFactor = Math.exp(lossDb * NEG_DB);
				}
				factors[b] *= lastFactor;
			}
		}
		// Energy at 1 m is 0 in bands the group does not cover, so these sums need no test.
		const continuousAt1m = g.continuousEnergyAt1m;
		for (let b = 0; b < BAND_COUNT; b++) continuousOut[b] += continuousAt1m[b] * factors[b];
		if (peakOut !== null) {
			const peakAt1m = g.peakEnergyAt1m;
			for (let b = 0; b < BAND_COUNT; b++) peakOut[b] += peakAt1m[b] * factors[b];
		}
		if (contributionsOut !== null)
			for (let b = 0; b < BAND_COUNT; b++) contributionsOut[j * BAND_COUNT + b] = factors[b];
	}
	return rRef;
}

/** Band levels from fillEnergy's sums, in place: 10·lg E_b − α_b·r_ref (−Infinity where E_b = 0). */
export function energyToLevels(energy: Float64Array, alphas: Float64Array, rRef: number): void {
	for (let b = 0; b < BAND_COUNT; b++) energy[b] = 10 * Math.log10(energy[b]) - alphas[b] * rRef;
}

/** Σ_b E_b · gain_b in dB: the driven level when the gains already hold 10^((drive_b + W_b)/10). */
export function gainedLevel(energy: Float64Array, gains: Float64Array): number {
	let total = 0;
	for (let b = 0; b < BAND_COUNT; b++) total += energy[b] * gains[b];
	return 10 * Math.log10(total);
}

/** 10^(x/10) */
export function dbToEnergy(db: number): number {
	return Math.exp(db * -NEG_DB);
}

/**
 * The driven level at a point from fillEnergy's continuous sums: sumLevels over the driven bands
 * of (drive_b + weighting_b + 10·lg E_b − α_b·r_ref), where drive_b = Q_b − contCap_b(position)
 * and NaN marks a band not driven. −Infinity when no driven band reaches the point.
 */
export function drivenLevel(
	energy: Float64Array,
	drive: Float64Array,
	weightingDb: Float64Array,
	alphas: Float64Array,
	rRef: number
): number {
	let total = 0;
	for (let b = 0; b < BAND_COUNT; b++) {
		const d = drive[b];
		if (d !== d || energy[b] === 0) continue; // NaN: band not driven
		total += energy[b] * Math.exp((d + weightingDb[b] - alphas[b] * rRef) * -NEG_DB);
	}
	return 10 * Math.log10(total);
}
