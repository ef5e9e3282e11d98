/**
 * The package at the position, and driven for the requirement (contract steps 3–4 and 8).
 * Capability per band at the position comes from the field (free field without a site; with a site
 * the point at distanceM on the aim bearing, at positionHeightM). Driving the package so the
 * position receives exactly Q_b sets each band's offset drive_b = Q_b − contCap_b(position); the same
 * drive gives drive_b + contCap_b(p) at any other point p. Bands the programme lacks, or no group
 * covers, are not driven (NaN) and make no sound.
 */
import { airConstants } from './absorption';
import { BAND_COUNT } from './bands';
import { dbToEnergy, energyToLevels, fillEnergy, type Environment } from './field';
import type { PreparedPackage } from './groups';
import { positionOnSite, siteField, type SiteField } from './placement';
import { requirementFor, type Requirement } from './requirement';
import type { CheckedSite } from './site';
import { BAND_WEIGHTINGS_DB } from './weighting';
import type { QuoteRequest, Weighting } from './types';

/**
 * The package at the position. Its arrays are module-level scratch, overwritten by the next call:
 * read them before evaluating again (evaluatePackage and levelGrid copy what they return).
 */
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
	/** Per weighting, 10^((drive_b + W_b)/10) (0 where not driven), filled by gainsFor when first needed. */
	gains: Record<Weighting, Float64Array>;
	gainsReady: Record<Weighting, boolean>;
	/** With a site, the package's cached field on it (placement.ts), else null. */
	field: SiteField | null;
}

const driven: DrivenPackage = {
	env: { alphas: new Float64Array(BAND_COUNT), inverseC: 0, freeField: true, groundFactor: null },
	requirement: { bandIndices: [], requiredDb: [], crestFactorDb: 0 },
	continuousDb: new Float64Array(BAND_COUNT),
	peakDb: new Float64Array(BAND_COUNT),
	contributions: new Float64Array(4 * BAND_COUNT),
	drive: new Float64Array(BAND_COUNT),
	gains: {
		A: new Float64Array(BAND_COUNT),
		C: new Float64Array(BAND_COUNT),
		Z: new Float64Array(BAND_COUNT)
	},
	gainsReady: { A: false, C: false, Z: false },
	field: null
};

/** Each weighting as a linear factor 10^(W_b/10) at the exact band frequencies. */
const LINEAR_WEIGHTINGS: Record<Weighting, Float64Array> = {
	A: BAND_WEIGHTINGS_DB.A.map(dbToEnergy),
	C: BAND_WEIGHTINGS_DB.C.map(dbToEnergy),
	Z: BAND_WEIGHTINGS_DB.Z.map(dbToEnergy)
};

/** 10^(drive_b/10), 0 where the band is not driven; filled with the drive. */
const linearDrive = new Float64Array(BAND_COUNT);

/** The linear drive gains in one weighting, 10^((drive_b + W_b)/10), computed once per drive. */
export function gainsFor(d: DrivenPackage, weighting: Weighting): Float64Array {
	const gains = d.gains[weighting];
	if (!d.gainsReady[weighting]) {
		const w = LINEAR_WEIGHTINGS[weighting];
		for (let b = 0; b < BAND_COUNT; b++) gains[b] = linearDrive[b] * w[b];
		d.gainsReady[weighting] = true;
	}
	return gains;
}

/**
 * The caller has checked the request (and site); air and programme are checked here. useField
 * (with a site) takes the position from the package's cached field on the site and leaves that
 * field in `field` for the other points.
 */
export function drivePackage(
	prepared: PreparedPackage,
	request: QuoteRequest,
	site: CheckedSite | null,
	useField = false
): DrivenPackage {
	const air = airConstants(request.air);
	const env = driven.env;
	env.alphas = air.alphas;
	env.inverseC = air.inverseC;
	env.freeField = site === null;
	env.groundFactor = site === null ? null : site.groundFactor;
	const requirement = requirementFor(
		request.programme,
		request.targetDb,
		request.weighting,
		driven.requirement
	);
	const { continuousDb, peakDb, drive } = driven;
	if (driven.contributions.length < prepared.groups.length * BAND_COUNT)
		driven.contributions = new Float64Array(prepared.groups.length * BAND_COUNT);
	// The position is on the aim bearing: off-axis angle 0 exactly.
	driven.field = null;
	if (site !== null && useField) {
		const field = (driven.field = siteField(prepared, site, air));
		positionOnSite(field, prepared, site, request.distanceM);
		continuousDb.set(field.positionContinuousDb);
		peakDb.set(field.positionPeakDb);
		driven.contributions.set(field.positionContributions);
	} else {
		const heightM = site === null ? 0 : site.positionHeightM;
		const rRef = fillEnergy(
			prepared.groups,
			env,
			request.distanceM,
			0,
			heightM,
			continuousDb,
			peakDb,
			driven.contributions
		);
		energyToLevels(continuousDb, env.alphas, rRef);
		energyToLevels(peakDb, env.alphas, rRef);
	}
	for (let b = 0; b < BAND_COUNT; b++) drive[b] = Number.NaN;
	driven.gainsReady.A = driven.gainsReady.C = driven.gainsReady.Z = false;
	for (let b = 0; b < BAND_COUNT; b++) linearDrive[b] = 0;
	for (let n = 0; n < requirement.bandIndices.length; n++) {
		const b = requirement.bandIndices[n];
		if (continuousDb[b] === -Infinity) continue;
		drive[b] = requirement.requiredDb[n] - continuousDb[b];
		if (site !== null) linearDrive[b] = dbToEnergy(drive[b]);
	}
	return driven;
}
