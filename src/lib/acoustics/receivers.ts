/**
 * Predictions at points other than the position (contract steps 8–10): the boundary, each site
 * receiver, grid points; then `limits`, `outcome` and the ranking of outcomes.
 */
import { BAND_COUNT } from './bands';
import { gainsFor, type DrivenPackage } from './drive';
import { drivenLevel, fillEnergy, gainedLevel } from './field';
import type { PreparedGroup, PreparedPackage } from './groups';
import { boundaryOnSite, type SiteField } from './placement';
import { DEFAULT_LISTENING_HEIGHT_M, type CheckedSite } from './site';
import { BAND_WEIGHTINGS_DB } from './weighting';
import {
	OUTCOME_ORDER,
	type BoundaryResult,
	type LimitsResult,
	type Outcome,
	type ReceiverResult,
	type Verdict,
	type Weighting
} from './types';

const energy = new Float64Array(BAND_COUNT);

/**
 * The driven continuous level at a point, in `weighting` — or, with `bandIndex` ≥ 0, that band's
 * unweighted level, null when it is not driven — before any allowance. −Infinity when no driven
 * band reaches the point.
 */
export function drivenLevelAt(
	groups: readonly PreparedGroup[],
	driven: DrivenPackage,
	dpM: number,
	phiDeg: number,
	heightM: number,
	weighting: Weighting,
	bandIndex = -1
): number | null {
	const drive = bandIndex < 0 ? 0 : driven.drive[bandIndex];
	if (drive !== drive) return null; // NaN: the programme lacks the band or no group covers it
	if (driven.env.freeField) {
		const rRef = fillEnergy(groups, driven.env, dpM, phiDeg, heightM, energy, null, null);
		if (bandIndex >= 0)
			return drive + 10 * Math.log10(energy[bandIndex]) - driven.env.alphas[bandIndex] * rRef;
		return drivenLevel(
			energy,
			driven.drive,
			BAND_WEIGHTINGS_DB[weighting],
			driven.env.alphas,
			rRef
		);
	}
	// With a site, all absorption goes inside the sums and the drive is applied as linear gains.
	fillEnergy(groups, driven.env, dpM, phiDeg, heightM, energy, null, null, true, bandIndex);
	return levelFromSums(energy, driven, weighting, bandIndex);
}

/** drivenLevelAt's site branch from sums already filled (all absorption inside). */
function levelFromSums(
	sums: Float64Array,
	driven: DrivenPackage,
	weighting: Weighting,
	bandIndex: number
): number | null {
	const drive = bandIndex < 0 ? 0 : driven.drive[bandIndex];
	if (drive !== drive) return null;
	if (bandIndex >= 0) return drive + 10 * Math.log10(sums[bandIndex]);
	return gainedLevel(sums, gainsFor(driven, weighting));
}

/** Step 8. Without a site: free field on axis at D. With one: D on the aim bearing, 1.5 m high, plus the allowance. */
export function boundaryPrediction(
	prepared: PreparedPackage,
	driven: DrivenPackage,
	site: CheckedSite | null,
	targetDb: number,
	boundary: { distanceM: number; limitDb: number; weighting: Weighting }
): BoundaryResult {
	const level = (
		site !== null && driven.field !== null
			? levelFromSums(
					boundaryOnSite(driven.field, prepared, site, boundary.distanceM),
					driven,
					boundary.weighting,
					-1
				)
			: drivenLevelAt(
					prepared.groups,
					driven,
					boundary.distanceM,
					0,
					DEFAULT_LISTENING_HEIGHT_M,
					boundary.weighting
				)
	) as number;
	const predictedDb = site === null ? level : level + site.allowanceDb;
	const marginDb = boundary.limitDb - predictedDb;
	return {
		predictedDb,
		limitDb: boundary.limitDb,
		weighting: boundary.weighting,
		marginDb,
		maxTargetDb: targetDb + marginDb
	};
}

/** Step 9: every receiver of the site, in the site's order, from the package's field on it. */
export function receiverPredictions(
	field: SiteField,
	driven: DrivenPackage,
	site: CheckedSite,
	targetDb: number
): ReceiverResult[] {
	const results: ReceiverResult[] = new Array(site.receivers.length);
	for (let i = 0; i < site.receivers.length; i++) {
		const r = site.receivers[i];
		const f = field.receivers[i];
		const distanceM = f.distanceM;
		const phi = f.offAxisDeg;
		const level = levelFromSums(f.energy, driven, r.weighting, f.band);
		const predictedDb = level === null ? null : level + site.allowanceDb;
		const marginDb = predictedDb === null ? null : r.limitDb - predictedDb;
		results[i] = {
			name: r.name,
			distanceM,
			offAxisDeg: phi,
			predictedDb,
			limitDb: r.limitDb,
			weighting: r.weighting,
			bandHz: r.bandHz ?? null,
			marginDb,
			maxTargetDb: marginDb === null ? null : targetDb + marginDb
		};
	}
	return results;
}

/**
 * Step 9 `limits`: over the receivers with a margin and the boundary. The smallest maxTargetDb
 * binds; on a tie the first in the site's order, the boundary after the receivers.
 */
export function limitsOf(
	receivers: readonly ReceiverResult[],
	boundary: BoundaryResult | null
): LimitsResult {
	let ok = true;
	let maxTargetDb: number | null = null;
	let bindingReceiver: string | null = null;
	for (let i = 0; i <= receivers.length; i++) {
		const last = i === receivers.length;
		if (last && boundary === null) break;
		const margin = last ? boundary!.marginDb : receivers[i].marginDb;
		if (margin === null) continue;
		const maxTarget = last ? boundary!.maxTargetDb : (receivers[i].maxTargetDb as number);
		if (!(margin >= 0)) ok = false;
		if (maxTargetDb === null || maxTarget < maxTargetDb) {
			maxTargetDb = maxTarget;
			bindingReceiver = last ? 'boundary' : receivers[i].name;
		}
	}
	return { ok, maxTargetDb, bindingReceiver };
}

/** 'short' when the verdict is short, else 'over-limit' when a limit is not met, else the verdict. */
export function outcomeOf(verdict: Verdict, limits: LimitsResult): Outcome {
	if (verdict === 'short') return 'short';
	return limits.ok ? verdict : 'over-limit';
}

/** Sort comparator for outcomes, best first: clear → tight → over-limit → short. */
export function compareOutcomes(a: Outcome, b: Outcome): number {
	return OUTCOME_ORDER.indexOf(a) - OUTCOME_ORDER.indexOf(b);
}
