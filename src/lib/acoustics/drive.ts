/**
 * Driving the package for the requirement (contract step 8): each band is set so the position
 * receives exactly Q_b, i.e. offset Δ_b = Q_b − contCap_b(d); the same drive gives Δ_b + contCap_b(x)
 * at any other distance x. Bands no group covers make no sound and are left out of the sum.
 */
import { BAND_WEIGHTINGS_DB } from './weighting';
import type { Requirement } from './requirement';
import type { Weighting } from './types';

export function drivenWeightedLevelDb(
	requirement: Requirement,
	capabilityAtPosition: Float64Array,
	capabilityAtDistance: Float64Array,
	weighting: Weighting
): number {
	const w = BAND_WEIGHTINGS_DB[weighting];
	let energy = 0;
	for (let n = 0; n < requirement.bandIndices.length; n++) {
		const b = requirement.bandIndices[n];
		if (capabilityAtPosition[b] === -Infinity) continue;
		const bandLevel = requirement.requiredDb[n] - capabilityAtPosition[b] + capabilityAtDistance[b];
		energy += Math.pow(10, (bandLevel + w[b]) / 10);
	}
	return 10 * Math.log10(energy);
}
