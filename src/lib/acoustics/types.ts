/** Input and output shapes of the acoustic model, exactly as in the contract (shared/acoustics.md). */
import type { NominalBandHz } from './bands';

export type Weighting = 'A' | 'C' | 'Z';

export interface Air {
	temperatureC: number;
	humidityPct: number;
	/** Ambient pressure; default 101.325 kPa. */
	pressureKPa?: number;
}

export type LoudspeakerKind = 'full-range' | 'subwoofer' | 'line-array-element' | 'monitor';

export interface LoudspeakerSpec {
	kind: LoudspeakerKind;
	/** On axis, at 1 m. */
	sensitivityDb: number;
	/** 2.83 V: S_1W = S − 10·log10(8 / impedanceOhm). */
	sensitivityRef: '1W' | '2.83V';
	/** Nominal impedance. */
	impedanceOhm: number;
	/** Continuous (AES-style) power rating. */
	powerContinuousW: number;
	/** Default 4 × continuous (+6 dB). */
	powerPeakW?: number;
	/** At 1 m; caps the continuous capability when given. */
	maxSplContinuousDb?: number;
	/** At 1 m; caps the peak capability when given. */
	maxSplPeakDb?: number;
	/** −6 dB coverage angles. */
	dispersionHDeg: number;
	dispersionVDeg: number;
	/** Usable range; a band counts if lowHz ≤ nominal centre ≤ highHz. */
	lowHz: number;
	highHz: number;
	/** Required for line-array elements. */
	heightM?: number;
}

export interface AmplifierSpec {
	channels: number;
	powerW: { 8?: number; 4?: number; 2?: number };
	minLoadOhm: number;
}

export interface GroupSpec {
	loudspeaker: LoudspeakerSpec;
	/** Cabinets per stack / per hang. */
	count: number;
	/** Stacks or hangs, default 1 (2 = left + right). */
	stacks?: number;
	amplifier: AmplifierSpec;
	/** Cabinets wired in parallel on one amplifier channel. */
	cabinetsPerChannel: number;
}

export interface PackageSpec {
	groups: GroupSpec[];
}

export interface Programme {
	/** Relative band levels (any reference) for the bands the programme needs. */
	bandsDb: Partial<Record<NominalBandHz, number>>;
	crestFactorDb: number;
}

export interface Boundary {
	distanceM: number;
	limitDb: number;
	weighting: Weighting;
}

export interface QuoteRequest {
	/** Average level (Leq) required at the position, in `weighting`. */
	targetDb: number;
	weighting: Weighting;
	/** From the system to the position. */
	distanceM: number;
	/** Width to cover at that distance. */
	audienceWidthM?: number;
	programme: Programme;
	air: Air;
	/** Default 3 dB. */
	marginDb?: number;
	boundary?: Boundary;
}

export type Verdict = 'clear' | 'tight' | 'short';

/** What binds a cabinet's capability: the amplifier's power, the cabinet's power rating, or its max SPL. */
export type CapabilityLimit = 'amplifier' | 'thermal' | 'max-spl';

export type LimitedBy = CapabilityLimit | 'no-coverage' | 'coverage';

export interface BandResult {
	/** Nominal band centre (31.5 … 8000); the computation used the exact base-10 frequency. */
	hz: NominalBandHz;
	requiredDb: number;
	requiredPeakDb: number;
	/** −Infinity when no group covers the band. */
	capabilityDb: number;
	capabilityPeakDb: number;
	headroomDb: number;
}

export interface CoverageResult {
	widthM: number;
	audienceWidthM: number | null;
	ok: boolean;
}

export interface BoundaryResult {
	predictedDb: number;
	limitDb: number;
	weighting: Weighting;
	marginDb: number;
	maxTargetDb: number;
}

export interface Evaluation {
	headroomDb: number;
	verdict: Verdict;
	limitingBandHz: number | null;
	limitedBy: LimitedBy | null;
	bands: BandResult[];
	amplifierChannelsNeeded: number;
	amplifiersNeeded: number;
	coverage: CoverageResult;
	boundary: BoundaryResult | null;
}
