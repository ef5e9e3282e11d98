/**
 * Predictions at points other than the position (contract steps 8–10): the boundary, each site
 * receiver, grid points; then `limits`, `outcome` and the ranking of outcomes.
 */
import { BAND_COUNT, bandIndexOf } from './bands';
import type { DrivenPackage } from './drive';
import { drivenLevel, fillEnergy } from './field';
import { offAxisDeg } from './geometry';
import type { PreparedGroup } from './groups';
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
const ONLY_BAND = new Float64Array(BAND_COUNT);

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
	const rRef = fillEnergy(groups, driven.env, dpM, phiDeg, heightM, energy, null, null);
	if (bandIndex < 0)
		return drivenLevel(
			energy,
			driven.drive,
			BAND_WEIGHTINGS_DB[weighting],
			driven.env.alphas,
			rRef
		);
	const drive = driven.drive[bandIndex];
	if (drive !== drive) return null; // NaN: the programme lacks the band or no group covers it
	ONLY_BAND.fill(Number.NaN);
	ONLY_BAND[bandIndex] = drive;
	return drivenLevel(energy, ONLY_BAND, BAND_WEIGHTINGS_DB.Z, driven.env.alphas, rRef);
}

/** Step 8. Without a site: free field on axis at D. With one: D on the aim bearing, 1.5 m high, plus the allowance. */
export function boundaryPrediction(
	groups: readonly PreparedGroup[],
	driven: DrivenPackage,
	site: CheckedSite | null,
	targetDb: number,
	boundary: { distanceM: number; limitDb: number; weighting: Weighting }
): BoundaryResult {
	const level = drivenLevelAt(
		groups,
		driven,
		boundary.distanceM,
		0,
		DEFAULT_LISTENING_HEIGHT_M,
		boundary.weighting
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

/** Step 9: every receiver of the site, in the site's order. */
export function receiverPredictions(
	groups: readonly PreparedGroup[],
	driven: DrivenPackage,
	site: CheckedSite,
	targetDb: number
): ReceiverResult[] {
	const results: ReceiverResult[] = new Array(site.receivers.length);
	for (let i = 0; i < site.receivers.length; i++) {
		const r = site.receivers[i];
		const distanceM = Math.sqrt(r.x * r.x + r.y * r.y);
		const phi = offAxisDeg(r.x, r.y, site.aimDeg);
		const band = r.bandHz === undefined ? -1 : bandIndexOf(r.bandHz);
		const level = drivenLevelAt(
			groups,
			driven,
			distanceM,
			phi,
			r.heightM ?? DEFAULT_LISTENING_HEIGHT_M,
			r.weighting,
			band
		);
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
