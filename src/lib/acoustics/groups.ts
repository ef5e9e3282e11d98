/**
 * Turns each GroupSpec into the numbers the hot loop needs, per band: whole-group energy at 1 m
 * (capability, band response and stacking gain), covered bands, the line-array transition, the
 * source-height ground terms and the prepared directivity. A package is prepared once and kept by
 * object identity (preparePackage), so quoting many requests against it repeats none of this.
 */
import { amplifierNeeds } from './amplifiers';
import {
	BAND_COUNT,
	EXACT_BAND_FREQUENCIES_HZ,
	NOMINAL_BAND_CENTRES_HZ,
	bandIndexOf
} from './bands';
import { stackCoverageWidthM } from './coverage';
import { prepareDirectivity, type PreparedDirectivity } from './directivity';
import {
	describe,
	fail,
	requireFinite,
	requirePositive,
	requireWholeCount,
	type Description
} from './errors';
import { heightTerms, type HeightTerms } from './ground';
import {
	cabinetCapability,
	checkAmplifier,
	checkLoudspeakerPower,
	type CabinetCapability
} from './power';
import type { SiteField } from './placement';
import type { CheckedSite } from './site';
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
	/** Per band: whole-group energy at 1 m, 10^((C1 + response_b + stacking gain)/10); 0 where not covered. */
	continuousEnergyAt1m: Float64Array;
	/** The same for P1. */
	peakEnergyAt1m: Float64Array;
	/** H = count·heightM for line arrays, else 0. */
	arrayLengthM: number;
	/** Per band H²·f_b/2: the transition distance d_t times c (0 for point sources). */
	transitionTimesC: Float64Array;
	isLineArray: boolean;
	/** 1 where lowHz ≤ nominal centre ≤ highHz. */
	covers: Uint8Array;
	/** Acoustic centre above ground (default 1.5 m) and its ISO 9613-2 height terms. */
	heightM: number;
	groundTerms: HeightTerms;
	directivity: PreparedDirectivity;
	/** Width covered at 1 m (2·tan(dispersionH/2), ∞ from 180°) for full-range and line arrays, else 0. */
	coverageWidthAt1m: number;
	/** spacingM when there is more than one stack, else 0. */
	coverageSpacingM: number;
}

export interface PreparedPackage {
	groups: PreparedGroup[];
	amplifierChannelsNeeded: number;
	amplifiersNeeded: number;
	/** This package's field on each site it was evaluated on (placement.ts), by CheckedSite. */
	siteFields: WeakMap<CheckedSite, SiteField>;
}

export const DEFAULT_GROUP_HEIGHT_M = 1.5;

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
	const heightM = optionalNonNegative(
		group.heightM,
		label,
		'height above ground (m)',
		DEFAULT_GROUP_HEIGHT_M
	);
	const spacingM = optionalNonNegative(group.spacingM, label, 'spacing between stacks (m)', 0);
	const response = bandResponse(spec.bandResponseDb, label);
	const directivity = prepareDirectivity(group, label);
	const gainDb = stackingGainDb(spec.kind, count, stacks);
	const capability = cabinetCapability(spec, group.amplifier, perChannel, label);
	const continuousEnergyAt1m = new Float64Array(BAND_COUNT);
	const peakEnergyAt1m = new Float64Array(BAND_COUNT);
	const transitionTimesC = new Float64Array(BAND_COUNT);
	for (let b = 0; b < BAND_COUNT; b++) {
		if (covers[b] === 0) continue;
		continuousEnergyAt1m[b] = Math.pow(10, (capability.continuousDb + response[b] + gainDb) / 10);
		peakEnergyAt1m[b] = Math.pow(10, (capability.peakDb + response[b] + gainDb) / 10);
		transitionTimesC[b] = (arrayLengthM * arrayLengthM * EXACT_BAND_FREQUENCIES_HZ[b]) / 2;
	}
	const spreads = spec.kind === 'full-range' || spec.kind === 'line-array-element';
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
		continuousEnergyAt1m,
		peakEnergyAt1m,
		arrayLengthM,
		transitionTimesC,
		isLineArray: spec.kind === 'line-array-element',
		covers,
		heightM,
		groundTerms: heightTerms(heightM),
		directivity,
		coverageWidthAt1m: spreads ? stackCoverageWidthM(dispersion, 1) : 0,
		coverageSpacingM: spreads && stacks > 1 ? spacingM : 0
	};
}

function optionalNonNegative(
	value: number | undefined,
	label: Description,
	field: string,
	fallback: number
): number {
	if (value === undefined) return fallback;
	const n = requireFinite(value, label, field);
	if (n < 0) fail(`${describe(label, field)} cannot be negative (got ${n}).`);
	return n;
}

/** Per band output re the sensitivity (dB), 0 where absent; refuses keys that are not bands. */
function bandResponse(
	response: Partial<Record<number, number>> | undefined,
	label: Description
): Float64Array {
	const out = new Float64Array(BAND_COUNT);
	if (response === undefined) return out;
	if (response === null || typeof response !== 'object')
		fail(`${describe(label)}: band response must map octave bands to dB.`);
	for (const key of Object.keys(response)) {
		const value = response[key as unknown as number];
		if (value === undefined) continue;
		const b = bandIndexOf(Number(key));
		if (b < 0)
			fail(
				`${describe(label)}: band response "${key}" is not one of the model's octave bands; use ${NOMINAL_BAND_CENTRES_HZ.join(', ')} (Hz).`
			);
		out[b] = requireFinite(value, label, `band response at ${key} Hz (dB)`);
	}
	return out;
}

interface CacheEntry {
	groupsRef: readonly unknown[];
	groupRefs: unknown[];
	prepared: PreparedPackage;
}

const PREPARED = new WeakMap<object, CacheEntry>();

/**
 * The package prepared for evaluation, kept by object identity: a package evaluated against many
 * requests (every request of a quote, every grid point, a bench) is checked and prepared once.
 * The cache is also dropped when the groups list or one of its group objects is replaced; a group
 * whose fields are edited in place must be replaced by a new object to be seen (documented in index.ts).
 */
export function preparePackage(pkg: PackageSpec): PreparedPackage {
	if (pkg === null || typeof pkg !== 'object' || !Array.isArray(pkg.groups))
		fail('Package must have a list of groups.');
	const cached = PREPARED.get(pkg);
	if (cached !== undefined && sameGroups(cached, pkg.groups)) return cached.prepared;
	const groups = pkg.groups.map(prepareGroup);
	const prepared: PreparedPackage = {
		groups,
		...amplifierNeeds(pkg.groups),
		siteFields: new WeakMap()
	};
	PREPARED.set(pkg, { groupsRef: pkg.groups, groupRefs: [...pkg.groups], prepared });
	return prepared;
}

function sameGroups(entry: CacheEntry, groups: readonly unknown[]): boolean {
	if (entry.groupsRef !== groups || entry.groupRefs.length !== groups.length) return false;
	for (let i = 0; i < groups.length; i++) if (entry.groupRefs[i] !== groups[i]) return false;
	return true;
}
