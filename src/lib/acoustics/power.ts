/**
 * Amplifier power into the real load (contract step 1), sensitivity conversion, and each cabinet's
 * capability at 1 m (step 2), with the reason that binds it.
 */
import { describe, fail, requireFinite, requirePositive, type Description } from './errors';
import type { AmplifierSpec, CapabilityLimit, LoudspeakerSpec } from './types';

/** The loads amplifier makers rate into, ascending. */
export const RATED_LOADS_OHM = [2, 4, 8] as const;

/** Relative tolerance for "at a rated load", so 16 Ω / 2 counts as exactly 8 Ω. */
const LOAD_MATCH_TOLERANCE = 1e-9;

/** 2.83 V into 8 Ω is 1 W; into Z it is 8/Z watts, so S_1W = S_2.83V − 10·log10(8/Z). */
export function sensitivity1WDb(
	spec: Pick<LoudspeakerSpec, 'sensitivityDb' | 'sensitivityRef' | 'impedanceOhm'>
): number {
	return spec.sensitivityRef === '2.83V'
		? spec.sensitivityDb - 10 * Math.log10(8 / spec.impedanceOhm)
		: spec.sensitivityDb;
}

/** Checks an amplifier spec; `label` names it in messages. */
export function checkAmplifier(amp: AmplifierSpec, label: Description): void {
	if (amp === null || typeof amp !== 'object') fail(`${describe(label)}: amplifier is missing.`);
	requirePositive(amp.minLoadOhm, label, 'amplifier minimum load (Ω)');
	let rated = 0;
	for (const load of RATED_LOADS_OHM) {
		const watts = amp.powerW?.[load];
		if (watts === undefined) continue;
		requirePositive(watts, label, `amplifier power into ${load} Ω (W)`);
		rated++;
	}
	if (rated === 0)
		fail(`${describe(label)}: amplifier has no power rating; give its power into 8, 4 or 2 Ω.`);
}

/**
 * Channel power into load Z_L (contract step 1). At a rated load, the rating. Otherwise take Z_r,
 * the smallest rated load above Z_L (the largest rated load when Z_L is above them all, i.e. 8 Ω
 * when Z_L > 8): the amplifier is then voltage-limited, so P = P(Z_r)·Z_r/Z_L, capped at the rating
 * of the largest rated load below Z_L if there is one (its current limit). Throws when Z_L is below
 * the amplifier's minimum load.
 */
export function channelPowerW(
	amp: AmplifierSpec,
	loadOhm: number,
	label: Description = 'Amplifier'
): number {
	if (loadOhm < amp.minLoadOhm * (1 - LOAD_MATCH_TOLERANCE)) {
		fail(
			`${describe(label)}: load below amplifier minimum — the cabinets on one channel present ${round2(loadOhm)} Ω ` +
				`but the amplifier is rated down to ${amp.minLoadOhm} Ω. Wire fewer cabinets per channel or use an amplifier rated for the lower load.`
		);
	}
	let above: number | undefined; // smallest rated load ≥ Z_L
	let below: number | undefined; // largest rated load < Z_L
	let largest: number | undefined;
	for (const load of RATED_LOADS_OHM) {
		if (amp.powerW[load] === undefined) continue;
		largest = load;
		if (Math.abs(loadOhm - load) <= LOAD_MATCH_TOLERANCE * load) return amp.powerW[load]!;
		if (load > loadOhm) above ??= load;
		else below = load;
	}
	const reference = above ?? largest;
	if (reference === undefined)
		fail(`${describe(label)}: amplifier has no power rating; give its power into 8, 4 or 2 Ω.`);
	const scaled = (amp.powerW[reference as 2 | 4 | 8]! * reference) / loadOhm;
	return below === undefined || below === reference
		? scaled
		: Math.min(scaled, amp.powerW[below as 2 | 4 | 8]!);
}

export interface CabinetCapability {
	/** P_cab: the channel's power shared between the cabinets on it. */
	powerPerCabinetW: number;
	/** C1 and P1: level at 1 m on axis, dB. */
	continuousDb: number;
	peakDb: number;
	continuousLimit: CapabilityLimit;
	peakLimit: CapabilityLimit;
}

/**
 * Step 2 (v2). C1 = S + 10·lg(min(P_cab, continuous rating)) − compressionDb, then min with the
 * continuous max SPL; P1 = S + 10·lg(min(2·P_cab, peak rating)), then min with the peak max SPL:
 * an amplifier rated P (sine, RMS) delivers peaks of 2P (+3.01 dB). The amplifier binds when its
 * power is strictly below the rating, the max SPL when the cap is strictly lower; otherwise thermal.
 * Per-band response is added later, per band (prepare.ts).
 */
export function cabinetCapability(
	spec: LoudspeakerSpec,
	amp: AmplifierSpec,
	cabinetsPerChannel: number,
	label: Description
): CabinetCapability {
	const loadOhm = spec.impedanceOhm / cabinetsPerChannel;
	const powerPerCabinetW = channelPowerW(amp, loadOhm, label) / cabinetsPerChannel;
	const s1w = sensitivity1WDb(spec);
	const peakRatingW = spec.powerPeakW ?? 4 * spec.powerContinuousW;
	const continuous = capped(
		s1w - (spec.compressionDb ?? 0),
		powerPerCabinetW,
		spec.powerContinuousW,
		spec.maxSplContinuousDb
	);
	const peak = capped(s1w, 2 * powerPerCabinetW, peakRatingW, spec.maxSplPeakDb);
	return {
		powerPerCabinetW,
		continuousDb: continuous.db,
		peakDb: peak.db,
		continuousLimit: continuous.limit,
		peakLimit: peak.limit
	};
}

function capped(
	levelAt1WDb: number,
	ampW: number,
	ratingW: number,
	maxSplDb: number | undefined
): { db: number; limit: CapabilityLimit } {
	const limit: CapabilityLimit = ampW < ratingW ? 'amplifier' : 'thermal';
	const db = levelAt1WDb + 10 * Math.log10(Math.min(ampW, ratingW));
	if (maxSplDb !== undefined && maxSplDb < db) return { db: maxSplDb, limit: 'max-spl' };
	return { db, limit };
}

/** Checks the loudspeaker fields the power and capability steps use. */
export function checkLoudspeakerPower(spec: LoudspeakerSpec, label: Description): void {
	requireFinite(spec.sensitivityDb, label, 'sensitivity (dB)');
	if (spec.sensitivityRef !== '1W' && spec.sensitivityRef !== '2.83V')
		fail(
			`${describe(label)}: sensitivity reference must be '1W' or '2.83V' (got "${String(spec.sensitivityRef)}").`
		);
	requirePositive(spec.impedanceOhm, label, 'impedance (Ω)');
	requirePositive(spec.powerContinuousW, label, 'continuous power rating (W)');
	if (spec.powerPeakW !== undefined)
		requirePositive(spec.powerPeakW, label, 'peak power rating (W)');
	if (spec.maxSplContinuousDb !== undefined)
		requireFinite(spec.maxSplContinuousDb, label, 'continuous max SPL (dB)');
	if (spec.maxSplPeakDb !== undefined) requireFinite(spec.maxSplPeakDb, label, 'peak max SPL (dB)');
	if (spec.compressionDb !== undefined) {
		const compression = requireFinite(spec.compressionDb, label, 'power compression (dB)');
		if (compression < 0)
			fail(`${describe(label)}: power compression cannot be negative (got ${compression} dB).`);
	}
}

function round2(x: number): number {
	return Math.round(x * 100) / 100;
}
