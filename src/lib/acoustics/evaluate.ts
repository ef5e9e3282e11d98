/** evaluatePackage: contract steps 1–8 in order. See index.ts for the method and its limits. */
import { bandAbsorption, normaliseAir } from './absorption';
import { amplifierNeeds } from './amplifiers';
import { BAND_COUNT, NOMINAL_BAND_CENTRES_HZ } from './bands';
import { coverageAt } from './coverage';
import { drivenWeightedLevelDb } from './drive';
import { fillCapabilities, groupOffsetDb, preparePackage, type PreparedGroup } from './groups';
import { DEFAULT_MARGIN_DB, checkRequest, requirementFor, type Requirement } from './requirement';
import { speedOfSound } from './units';
import type {
	BandResult,
	Boundary,
	BoundaryResult,
	CapabilityLimit,
	Evaluation,
	LimitedBy,
	LimitsResult,
	Outcome,
	PackageSpec,
	QuoteRequest,
	Verdict
} from './types';

export function evaluatePackage(pkg: PackageSpec, request: QuoteRequest): Evaluation {
	checkRequest(request);
	const air = normaliseAir(request.air);
	const groups = preparePackage(pkg);
	const requirement = requirementFor(request.programme, request.targetDb, request.weighting);
	const alphas = bandAbsorption(air);
	const c = speedOfSound(air.temperatureC);
	const distanceM = request.distanceM;

	const continuous = new Float64Array(BAND_COUNT);
	const peak = new Float64Array(BAND_COUNT);
	fillCapabilities(groups, distanceM, alphas, c, continuous, peak);

	// Step 5: per-band headroom; the lowest band wins a tie because the scan is ascending and strict.
	const crest = requirement.crestFactorDb;
	const bands: BandResult[] = new Array(requirement.bandIndices.length);
	let headroomDb = Infinity;
	let limitingBand = -1;
	let limitingSide: 'peak' | 'continuous' = 'peak';
	for (let n = 0; n < requirement.bandIndices.length; n++) {
		const b = requirement.bandIndices[n];
		const requiredDb = requirement.requiredDb[n];
		const peakHeadroom = peak[b] - (requiredDb + crest);
		const continuousHeadroom = continuous[b] - requiredDb;
		const bandHeadroom = Math.min(peakHeadroom, continuousHeadroom);
		bands[n] = {
			hz: NOMINAL_BAND_CENTRES_HZ[b],
			requiredDb,
			requiredPeakDb: requiredDb + crest,
			capabilityDb: continuous[b],
			capabilityPeakDb: peak[b],
			headroomDb: bandHeadroom
		};
		if (bandHeadroom < headroomDb) {
			headroomDb = bandHeadroom;
			limitingBand = b;
			limitingSide = peakHeadroom <= continuousHeadroom ? 'peak' : 'continuous';
		}
	}
	let limitedBy: LimitedBy =
		continuous[limitingBand] === -Infinity
			? 'no-coverage'
			: bindingLimit(groups, limitingBand, limitingSide, distanceM, alphas[limitingBand], c);

	// Steps 6 and 7.
	const coverage = coverageAt(groups, distanceM, request.audienceWidthM);
	const marginDb = request.marginDb ?? DEFAULT_MARGIN_DB;
	const verdict: Verdict =
		!coverage.ok || headroomDb < 0 ? 'short' : headroomDb >= marginDb ? 'clear' : 'tight';
	if (!coverage.ok && headroomDb >= 0) limitedBy = 'coverage';

	const boundary = request.boundary
		? boundaryPrediction(
				groups,
				requirement,
				continuous,
				request.targetDb,
				request.boundary,
				alphas,
				c
			)
		: null;
	// Step 9 without a site: the boundary is the only limit.
	const limits: LimitsResult = boundary
		? { ok: boundary.marginDb >= 0, maxTargetDb: boundary.maxTargetDb, bindingReceiver: 'boundary' }
		: { ok: true, maxTargetDb: null, bindingReceiver: null };
	const outcome: Outcome = verdict === 'short' ? 'short' : limits.ok ? verdict : 'over-limit';
	return {
		headroomDb,
		verdict,
		limitingBandHz: NOMINAL_BAND_CENTRES_HZ[limitingBand],
		limitedBy,
		bands,
		...amplifierNeeds(pkg.groups),
		coverage,
		boundary,
		receivers: [],
		limits,
		outcome
	};
}

/**
 * What binds in the limiting band: among the groups covering it, the one contributing the most
 * to the binding side's capability (the first in package order on a tie), and that group's limit.
 */
function bindingLimit(
	groups: readonly PreparedGroup[],
	band: number,
	side: 'peak' | 'continuous',
	distanceM: number,
	alphaDbPerM: number,
	c: number
): CapabilityLimit {
	let loudest: PreparedGroup | undefined;
	let loudestDb = -Infinity;
	for (const g of groups) {
		if (g.covers[band] === 0) continue;
		const level =
			(side === 'peak' ? g.peakDb : g.continuousDb) +
			groupOffsetDb(g, band, distanceM, alphaDbPerM, c);
		if (loudest === undefined || level > loudestDb) {
			loudest = g;
			loudestDb = level;
		}
	}
	// The caller checked the band is covered, so a group was found.
	return side === 'peak' ? loudest!.peakLimit : loudest!.continuousLimit;
}

/** Step 8: the level at the boundary with the package driven to give exactly Q_b at the position. */
function boundaryPrediction(
	groups: readonly PreparedGroup[],
	requirement: Requirement,
	continuousAtPosition: Float64Array,
	targetDb: number,
	boundary: Boundary,
	alphas: Float64Array,
	c: number
): BoundaryResult {
	const continuousAtBoundary = new Float64Array(BAND_COUNT);
	const peakAtBoundary = new Float64Array(BAND_COUNT);
	fillCapabilities(groups, boundary.distanceM, alphas, c, continuousAtBoundary, peakAtBoundary);
	const predictedDb = drivenWeightedLevelDb(
		requirement,
		continuousAtPosition,
		continuousAtBoundary,
		boundary.weighting
	);
	const marginDb = boundary.limitDb - predictedDb;
	return {
		predictedDb,
		limitDb: boundary.limitDb,
		weighting: boundary.weighting,
		marginDb,
		maxTargetDb: targetDb + marginDb
	};
}
