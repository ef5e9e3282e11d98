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
/** A_r of the point's own region: the same for every group, so worked out once per point. */
const receiverRegion = new Float64Array(BAND_COUNT);
const distance: DistanceTerms = { near: 0, far: 0 };
let receiverTermsHeight = Number.NaN;
const receiverTerms: HeightTerms = heightTerms(0);

/**
 * Fills continuousOut (and peakOut, contributionsOut when given) with the energy sums at a point
 * at horizontal distance dpM, off-axis angle phiDeg and height hM; returns r_ref. With a free-field
 * environment only dpM is used. contributionsOut[j·9 + b] receives group j's factor in band b
 * (E1m · factor is its energy), for naming the group that binds.
 */
export function fillEnergy(
	groups: readonly PreparedGroup[],
	env: Environment,
	dpM: number,
	phiDeg: number,
	hM: number,
	continuousOut: Float64Array,
	peakOut: Float64Array | null,
	contributionsOut: Float64Array | null
): number {
	const rRef = dpM < 1 ? 1 : dpM;
	const alphas = env.alphas;
	const G = env.groundFactor;
	const site = !env.freeField;
	const ground = site && G !== null;
	if (ground) {
		distanceTerms(dpM, distance);
		if (hM !== receiverTermsHeight) {
			heightTerms(hM, receiverTerms);
			receiverTermsHeight = hM;
		}
		receiverRegion.fill(0);
		addRegion(receiverTerms, distance, G, receiverRegion);
	}
	continuousOut.fill(0);
	if (peakOut !== null) peakOut.fill(0);
	for (let j = 0; j < groups.length; j++) {
		const g = groups[j];
		let r = rRef;
		if (site) {
			const dh = hM - g.heightM;
			r = Math.sqrt(dpM * dpM + dh * dh);
			if (r < 1) r = 1;
			fillDirectivity(g.directivity, phiDeg, attenuation);
			if (ground) {
				for (let b = 0; b < BAND_COUNT; b++) attenuation[b] += receiverRegion[b];
				addRegion(g.groundTerms, distance, G, attenuation);
				addMiddleRegion(g.heightM + hM, dpM, G, attenuation);
			}
		}
		const extra = r - rRef;
		const inverseSquare = 1 / (r * r);
		const covers = g.covers;
		for (let b = 0; b < BAND_COUNT; b++) {
			if (covers[b] === 0) continue;
			let factor = inverseSquare;
			if (g.isLineArray) {
				const transitionM = g.transitionTimesC[b] * env.inverseC;
				if (transitionM > 1 && r < transitionM) factor = 1 / (transitionM * r);
			}
			const lossDb = site ? alphas[b] * extra + attenuation[b] : 0;
			if (lossDb !== 0) factor *= Math.exp(lossDb * NEG_DB);
			continuousOut[b] += g.continuousEnergyAt1m[b] * factor;
			if (peakOut !== null) peakOut[b] += g.peakEnergyAt1m[b] * factor;
			if (contributionsOut !== null) contributionsOut[j * BAND_COUNT + b] = factor;
		}
	}
	return rRef;
}

/** Band levels from fillEnergy's sums, in place: 10·lg E_b − α_b·r_ref (−Infinity where E_b = 0). */
export function energyToLevels(energy: Float64Array, alphas: Float64Array, rRef: number): void {
	for (let b = 0; b < BAND_COUNT; b++) energy[b] = 10 * Math.log10(energy[b]) - alphas[b] * rRef;
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
