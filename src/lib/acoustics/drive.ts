/**
 * The package at the position, and driven for the requirement (contract steps 3–4 and 8).
 * Capability per band at the position comes from the field (free field without a site; with a site
 * the point at distanceM on the aim bearing, at positionHeightM). Driving the package so the
 * position receives exactly Q_b sets each band's offset drive_b = Q_b − contCap_b(position); the same
 * drive gives drive_b + contCap_b(p) at any other point p. Bands the programme lacks, or no group
 * covers, are not driven (NaN) and make no sound.
 */
import { bandAbsorption, normaliseAir } from './absorption';
import { BAND_COUNT } from './bands';
import { energyToLevels, fillEnergy, type Environment } from './field';
import type { PreparedPackage } from './groups';
import { requirementFor, type Requirement } from './requirement';
import type { CheckedSite } from './site';
import { speedOfSound } from './units';
import type { QuoteRequest } from './types';

export interface DrivenPackage {
	env: Environment;
	requirement: Requirement;
	/** contCap_b and peakCap_b at the position (dB), −Infinity where no group covers the band. */
	continuousDb: Float64Array;
	peakDb: Float64Array;
	/** Group j's factor in band b at the position, at [j·9 + b] (see fillEnergy). */
	contributions: Float64Array;
	/** drive_b = Q_b − contCap_b(position); NaN where the band is not driven. */
	drive: Float64Array;
}

export function environmentFor(request: QuoteRequest, site: CheckedSite | null): Environment {
	const air = normaliseAir(request.air);
	return {
		alphas: bandAbsorption(air),
		inverseC: 1 / speedOfSound(air.temperatureC),
		freeField: site === null,
		groundFactor: site === null ? null : site.groundFactor
	};
}

/** The caller has checked the request (and site). */
export function drivePackage(
	prepared: PreparedPackage,
	request: QuoteRequest,
	site: CheckedSite | null
): DrivenPackage {
	const env = environmentFor(request, site);
	const requirement = requirementFor(request.programme, request.targetDb, request.weighting);
	const continuousDb = new Float64Array(BAND_COUNT);
	const peakDb = new Float64Array(BAND_COUNT);
	const contributions = new Float64Array(prepared.groups.length * BAND_COUNT);
	// The position is on the aim bearing: off-axis angle 0 exactly.
	const heightM = site === null ? 0 : site.positionHeightM;
	const rRef = fillEnergy(
		prepared.groups,
		env,
		request.distanceM,
		0,
		heightM,
		continuousDb,
		peakDb,
		contributions
	);
	energyToLevels(continuousDb, env.alphas, rRef);
	energyToLevels(peakDb, env.alphas, rRef);
	const drive = new Float64Array(BAND_COUNT).fill(Number.NaN);
	for (let n = 0; n < requirement.bandIndices.length; n++) {
		const b = requirement.bandIndices[n];
		if (continuousDb[b] !== -Infinity) drive[b] = requirement.requiredDb[n] - continuousDb[b];
	}
	return { env, requirement, continuousDb, peakDb, contributions, drive };
}
