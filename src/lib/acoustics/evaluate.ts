/** evaluatePackage: contract steps 1–9 in order. See index.ts for the method and its limits. */
import { BAND_COUNT, NOMINAL_BAND_CENTRES_HZ } from './bands';
import { coverageAt } from './coverage';
import { drivePackage, type DrivenPackage } from './drive';
import { preparePackage, type PreparedGroup } from './groups';
import { boundaryPrediction, limitsOf, outcomeOf, receiverPredictions } from './receivers';
import { DEFAULT_MARGIN_DB, checkRequest } from './requirement';
import { checkSiteOnce } from './site';
import type {
	BandResult,
	CapabilityLimit,
	Evaluation,
	LimitedBy,
	PackageSpec,
	QuoteRequest,
	Verdict
} from './types';

const NO_RECEIVERS: never[] = [];

export function evaluatePackage(pkg: PackageSpec, request: QuoteRequest): Evaluation {
	checkRequest(request);
	const site = request.site === undefined ? null : checkSiteOnce(request.site);
	const prepared = preparePackage(pkg);
	const groups = prepared.groups;
	const driven = drivePackage(prepared, request, site, true);
	const { requirement, continuousDb: continuous, peakDb: peak } = driven;

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
		const bandHeadroom = peakHeadroom < continuousHeadroom ? peakHeadroom : continuousHeadroom;
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
			: bindingLimit(groups, driven, limitingBand, limitingSide);

	// Steps 6 and 7. Coverage at the horizontal distance to the position (dispersion spreads in plan).
	const coverage = coverageAt(groups, request.distanceM, request.audienceWidthM);
	const marginDb = request.marginDb ?? DEFAULT_MARGIN_DB;
	const verdict: Verdict =
		!coverage.ok || headroomDb < 0 ? 'short' : headroomDb >= marginDb ? 'clear' : 'tight';
	if (!coverage.ok && headroomDb >= 0) limitedBy = 'coverage';

	// Steps 8 and 9.
	const boundary = request.boundary
		? boundaryPrediction(prepared, driven, site, request.targetDb, request.boundary)
		: null;
	const receivers =
		site === null || site.receivers.length === 0
			? NO_RECEIVERS
			: receiverPredictions(driven.field!, driven, site, request.targetDb);
	const limits = limitsOf(receivers, boundary);
	return {
		headroomDb,
		verdict,
		limitingBandHz: NOMINAL_BAND_CENTRES_HZ[limitingBand],
		limitedBy,
		bands,
		amplifierChannelsNeeded: prepared.amplifierChannelsNeeded,
		amplifiersNeeded: prepared.amplifiersNeeded,
		coverage,
		boundary,
		receivers: receivers === NO_RECEIVERS ? [] : receivers,
		limits,
		outcome: outcomeOf(verdict, limits)
	};
}

/**
 * What binds in the limiting band: among the groups covering it, the one contributing the most
 * to the binding side's capability at the position (the first in package order on a tie), and
 * that group's limit.
 */
function bindingLimit(
	groups: readonly PreparedGroup[],
	driven: DrivenPackage,
	band: number,
	side: 'peak' | 'continuous'
): CapabilityLimit {
	let loudest: PreparedGroup | undefined;
	let loudestEnergy = -1;
	for (let j = 0; j < groups.length; j++) {
		const g = groups[j];
		if (g.covers[band] === 0) continue;
		const atOneMetre = side === 'peak' ? g.peakEnergyAt1m[band] : g.continuousEnergyAt1m[band];
		const energy = atOneMetre * driven.contributions[j * BAND_COUNT + band];
		if (energy > loudestEnergy) {
			loudest = g;
			loudestEnergy = energy;
		}
	}
	// The caller checked the band is covered, so a group was found.
	return side === 'peak' ? loudest!.peakLimit : loudest!.continuousLimit;
}
