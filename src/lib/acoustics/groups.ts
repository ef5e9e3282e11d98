/**
 * Turns each GroupSpec into the few numbers the hot loop needs (capability at 1 m, stacking gain,
 * covered bands, array length), and applies the contract's group laws (step 3) at any distance.
 */
import { BAND_COUNT, EXACT_BAND_FREQUENCIES_HZ, NOMINAL_BAND_CENTRES_HZ } from './bands';
import { fail, requirePositive, requireWholeCount } from './errors';
import { lineSourceDivergenceDb, lineSourceTransitionM, pointSourceDivergenceDb } from './levels';
import {
	cabinetCapability,
	checkAmplifier,
	checkLoudspeakerPower,
	type CabinetCapability
} from './power';
import type { GroupSpec, LoudspeakerKind, PackageSpec } from './types';

const KINDS: readonly LoudspeakerKind[] = [
	'full-range',
	'subwoofer',
	'line-array-element',
	'monitor'
];

export interface PreparedGroup extends CabinetCapability {
	spec: GroupSpec;
	kind: LoudspeakerKind;
	count: number;
	stacks: number;
	/** Level gain of the whole group over one cabinet, before divergence (dB). */
	stackingGainDb: number;
	/** Whole-group energy at 1 m before divergence, 10^((C1 + stacking gain)/10), and the same for P1. */
	continuousEnergyAt1m: number;
	peakEnergyAt1m: number;
	/** H = count·heightM for line arrays, else 0. */
	arrayLengthM: number;
	/** 1 where lowHz ≤ nominal centre ≤ highHz. */
	covers: Uint8Array;
}

export function groupLabel(index: number, kind: unknown): string {
	return `Group ${index + 1} (${String(kind)})`;
}

/**
 * Stacking gain: full-range and monitor cabinets add incoherently (10·lg(count·stacks)); subwoofers
 * and line-array elements add coherently within a stack (20·lg count) and incoherently between
 * stacks (10·lg stacks).
 */
function stackingGainDb(kind: LoudspeakerKind, count: number, stacks: number): number {
	return kind === 'full-range' || kind === 'monitor'
		? 10 * Math.log10(count * stacks)
		: 20 * Math.log10(count) + 10 * Math.log10(stacks);
}

export function prepareGroup(group: GroupSpec, index: number): PreparedGroup {
	if (group === null || typeof group !== 'object') fail(`Group ${index + 1} is missing.`);
	const spec = group.loudspeaker;
	if (spec === null || typeof spec !== 'object')
		fail(`Group ${index + 1}: loudspeaker is missing.`);
	const label = () => groupLabel(index, spec.kind);
	if (!KINDS.includes(spec.kind))
		fail(`${label()}: unknown loudspeaker kind; use ${KINDS.join(', ')}.`);
	const count = requireWholeCount(group.count, label, 'cabinet count');
	const stacks = group.stacks === undefined ? 1 : requireWholeCount(group.stacks, label, 'stacks');
	const perChannel = requireWholeCount(group.cabinetsPerChannel, label, 'cabinets per channel');
	if (perChannel > count)
		fail(
			`${label()}: ${perChannel} cabinets per channel but only ${count} in each stack; a channel drives cabinets of one stack.`
		);
	requireWholeCount(group.amplifier?.channels, label, 'amplifier channels');
	checkAmplifier(group.amplifier, label);
	checkLoudspeakerPower(spec, label);
	const dispersion = requirePositive(spec.dispersionHDeg, label, 'horizontal dispersion (°)');
	if (dispersion > 360)
		fail(`${label()}: horizontal dispersion cannot exceed 360° (got ${dispersion}).`);
	const lowHz = requirePositive(spec.lowHz, label, 'low frequency limit (Hz)');
	const highHz = requirePositive(spec.highHz, label, 'high frequency limit (Hz)');
	if (lowHz > highHz)
		fail(`${label()}: low frequency limit ${lowHz} Hz is above the high limit ${highHz} Hz.`);
	let arrayLengthM = 0;
	if (spec.kind === 'line-array-element') {
		if (spec.heightM === undefined)
			fail(
				`${label()}: a line-array element needs its height (heightM) to work out the array length.`
			);
		arrayLengthM = count * requirePositive(spec.heightM, label, 'element height (m)');
	}
	const covers = new Uint8Array(BAND_COUNT);
	for (let i = 0; i < BAND_COUNT; i++)
		covers[i] = lowHz <= NOMINAL_BAND_CENTRES_HZ[i] && NOMINAL_BAND_CENTRES_HZ[i] <= highHz ? 1 : 0;
	const gainDb = stackingGainDb(spec.kind, count, stacks);
	const capability = cabinetCapability(spec, group.amplifier, perChannel, label);
	// Fields listed one by one (no spread) so every prepared group shares one object shape.
	return {
		powerPerCabinetW: capability.powerPerCabinetW,
		continuousDb: capability.continuousDb,
		peakDb: capability.peakDb,
		continuousLimit: capability.continuousLimit,
		peakLimit: capability.peakLimit,
		spec: group,
		kind: spec.kind,
		count,
		stacks,
		stackingGainDb: gainDb,
		continuousEnergyAt1m: Math.pow(10, (capability.continuousDb + gainDb) / 10),
		peakEnergyAt1m: Math.pow(10, (capability.peakDb + gainDb) / 10),
		arrayLengthM,
		covers
	};
}

export function preparePackage(pkg: PackageSpec): PreparedGroup[] {
	if (pkg === null || typeof pkg !== 'object' || !Array.isArray(pkg.groups))
		fail('Package must have a list of groups.');
	return pkg.groups.map(prepareGroup);
}

/**
 * Level of one group in band `band` at distance x relative to its per-cabinet 1 m capability:
 * add C1 (or P1) to get the group's level. Step 3 of the contract, air absorption included.
 */
export function groupOffsetDb(
	g: PreparedGroup,
	band: number,
	distanceM: number,
	alphaDbPerM: number,
	speedOfSound: number
): number {
	const divergence =
		g.kind === 'line-array-element'
			? lineSourceDivergenceDb(
					distanceM,
					lineSourceTransitionM(g.arrayLengthM, EXACT_BAND_FREQUENCIES_HZ[band], speedOfSound)
				)
			: pointSourceDivergenceDb(distanceM);
	return g.stackingGainDb - divergence - alphaDbPerM * distanceM;
}

/**
 * Package capability (continuous and peak) at distance x in every band: the energy sum over the
 * groups covering each band; −Infinity where none does. Writes into the arrays given.
 * Sums in linear energy, where both divergence laws are algebraic (10^(−20·lg x/10) = 1/x²,
 * 10^(−10·lg(d_t·x)/10) = 1/(d_t·x)), so the inner loop needs no logarithm or power. Air
 * absorption is the same for every group in a band, so it is subtracted in dB after the sum, which
 * also keeps a covered band finite at any distance. Agrees with summing L1 + groupOffsetDb (tested).
 */
export function fillCapabilities(
	groups: readonly PreparedGroup[],
	distanceM: number,
	alphas: Float64Array,
	speedOfSound: number,
	continuousOut: Float64Array,
	peakOut: Float64Array
): void {
	const inverseSquare = 1 / (distanceM * distanceM);
	for (let b = 0; b < BAND_COUNT; b++) {
		let continuousEnergy = 0;
		let peakEnergy = 0;
		for (let j = 0; j < groups.length; j++) {
			const g = groups[j];
			if (g.covers[b] === 0) continue;
			let spreading = inverseSquare;
			if (g.kind === 'line-array-element') {
				const transitionM = lineSourceTransitionM(
					g.arrayLengthM,
					EXACT_BAND_FREQUENCIES_HZ[b],
					speedOfSound
				);
				if (transitionM > 1 && distanceM < transitionM) spreading = 1 / (transitionM * distanceM);
			}
			continuousEnergy += g.continuousEnergyAt1m * spreading;
			peakEnergy += g.peakEnergyAt1m * spreading;
		}
		const absorptionDb = alphas[b] * distanceM;
		continuousOut[b] = 10 * Math.log10(continuousEnergy) - absorptionDb;
		peakOut[b] = 10 * Math.log10(peakEnergy) - absorptionDb;
	}
}
