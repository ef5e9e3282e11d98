/**
 * Level versus distance, for the chart. The package is driven exactly as in contract step 8 — so
 * that the position at request.distanceM receives exactly Q_b in every band it covers — and the
 * continuous level that drive produces is reported at each distance in A, C and Z weighting.
 * By construction the curve passes through request.targetDb (in request.weighting) at the position
 * and, without a site, through boundary.predictedDb at the boundary distance. It is the level the programme would
 * reach when run at the target, not the package's maximum: compare with Evaluation.headroomDb for that.
 */
import { BAND_COUNT } from './bands';
import { drivePackage } from './drive';
import { drivenLevel, fillEnergy } from './field';
import { preparePackage } from './groups';
import { checkDistance, checkRequest } from './requirement';
import { BAND_WEIGHTINGS_DB } from './weighting';
import type { PackageSpec, QuoteRequest, Weighting } from './types';

export type WeightedLevels = Record<Weighting, number>;

export interface LevelPoint {
	distanceM: number;
	/** Continuous (Leq) level in dB re 20 µPa per weighting; −Infinity if the package covers no programme band. */
	levels: WeightedLevels;
}

/**
 * The driven level at each distance (metres, each positive and finite), free field on the system's
 * axis (contract step 3): a site in the request is not applied here, so the curve is the v2 model
 * without a site; receivers and levelGrid give the levels on a site.
 */
export function levelCurve(
	pkg: PackageSpec,
	request: QuoteRequest,
	distancesM: readonly number[]
): LevelPoint[] {
	checkRequest(request);
	const prepared = preparePackage(pkg);
	const driven = drivePackage(prepared, request, null);
	const energy = new Float64Array(BAND_COUNT);
	const at = (rRef: number, w: Weighting) =>
		drivenLevel(energy, driven.drive, BAND_WEIGHTINGS_DB[w], driven.env.alphas, rRef);
	return distancesM.map((distanceM) => {
		checkDistance(distanceM, 'Chart distance');
		const rRef = fillEnergy(prepared.groups, driven.env, distanceM, 0, 0, energy, null, null);
		return { distanceM, levels: { A: at(rRef, 'A'), C: at(rRef, 'C'), Z: at(rRef, 'Z') } };
	});
}

/** The driven level at one distance; see levelCurve. */
export function levelAtDistance(
	pkg: PackageSpec,
	request: QuoteRequest,
	distanceM: number
): WeightedLevels {
	return levelCurve(pkg, request, [distanceM])[0].levels;
}
