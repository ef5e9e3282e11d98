/**
 * Level versus distance, for the chart. The package is driven exactly as in contract step 8 — so
 * that the position at request.distanceM receives exactly Q_b in every band it covers — and the
 * continuous level that drive produces is reported at each distance in A, C and Z weighting.
 * By construction the curve passes through request.targetDb (in request.weighting) at the position
 * and through boundary.predictedDb at the boundary distance. It is the level the programme would
 * reach when run at the target, not the package's maximum: compare with Evaluation.headroomDb for that.
 */
import { bandAbsorption, normaliseAir } from './absorption';
import { BAND_COUNT } from './bands';
import { drivenWeightedLevelDb } from './drive';
import { fillCapabilities, preparePackage } from './groups';
import { checkDistance, checkRequest, requirementFor } from './requirement';
import { speedOfSound } from './units';
import type { PackageSpec, QuoteRequest, Weighting } from './types';

export type WeightedLevels = Record<Weighting, number>;

export interface LevelPoint {
	distanceM: number;
	/** Continuous (Leq) level in dB re 20 µPa per weighting; −Infinity if the package covers no programme band. */
	levels: WeightedLevels;
}

/** The driven level at each distance (metres, each positive and finite). */
export function levelCurve(
	pkg: PackageSpec,
	request: QuoteRequest,
	distancesM: readonly number[]
): LevelPoint[] {
	checkRequest(request);
	const air = normaliseAir(request.air);
	const groups = preparePackage(pkg);
	const requirement = requirementFor(request.programme, request.targetDb, request.weighting);
	const alphas = bandAbsorption(air);
	const c = speedOfSound(air.temperatureC);
	const atPosition = new Float64Array(BAND_COUNT);
	const atDistance = new Float64Array(BAND_COUNT);
	const unusedPeak = new Float64Array(BAND_COUNT);
	fillCapabilities(groups, request.distanceM, alphas, c, atPosition, unusedPeak);
	return distancesM.map((distanceM) => {
		checkDistance(distanceM, 'Chart distance');
		fillCapabilities(groups, distanceM, alphas, c, atDistance, unusedPeak);
		return {
			distanceM,
			levels: {
				A: drivenWeightedLevelDb(requirement, atPosition, atDistance, 'A'),
				C: drivenWeightedLevelDb(requirement, atPosition, atDistance, 'C'),
				Z: drivenWeightedLevelDb(requirement, atPosition, atDistance, 'Z')
			}
		};
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
