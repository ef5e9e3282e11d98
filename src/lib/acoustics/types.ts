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
	/** v2: output in a band relative to the sensitivity (0 = flat, the default). */
	bandResponseDb?: Partial<Record<NominalBandHz, number>>;
	/** v2: power compression at full continuous power, default 0. */
	compressionDb?: number;
	/** v2: horizontal pattern; without one the model uses the contract's cautious default (step 3b). */
	directivity?: Directivity;
}

/** Attenuation re on-axis (dB ≥ 0), symmetric left/right; one row per band, one value per angle. */
export interface Directivity {
	/** Ascending, first 0, last 180. */
	anglesDeg: number[];
	bandsDb: Partial<Record<NominalBandHz, number[]>>;
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
	/** v2: acoustic centre above ground, used with a site; default 1.5. */
	heightM?: number;
	/** v2: distance between the outermost stacks or hangs; default 0. */
	spacingM?: number;
	/** v2: the arrangement's own pattern (e.g. cardioid subs); overrides the loudspeaker's. */
	directivity?: Directivity;
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
	/** v2: where the system stands and aims, the ground, and the receivers with their limits. */
	site?: Site;
}

/** A limit on one octave band, unweighted. */
export type ReceiverBandHz = 63 | 125;

export interface Receiver {
	name: string;
	/** Metres; x east, y north; the system stands at the origin. */
	x: number;
	y: number;
	/** Default 1.5. */
	heightM?: number;
	limitDb: number;
	weighting: Weighting;
	bandHz?: ReceiverBandHz;
}

export interface Site {
	/** Bearing the system faces, degrees clockwise from north (+y). */
	aimDeg: number;
	/** ISO 9613-2 G (0 hard … 1 porous) for all three regions; null: no ground term. */
	groundFactor: number | null;
	/** Height of the position (front of house), default 1.5. */
	positionHeightM?: number;
	/** Added to every receiver and grid level (weather, inversions), default 0. */
	allowanceDb?: number;
	receivers: Receiver[];
}

export interface Grid {
	xMinM: number;
	yMinM: number;
	xMaxM: number;
	yMaxM: number;
	stepM: number;
	/** Default 1.5. */
	heightM?: number;
	weighting: Weighting;
}

export interface LevelGrid {
	nx: number;
	ny: number;
	/** Row by row from yMin; NaN where no band has a level. */
	levels: Float64Array;
}

export type Verdict = 'clear' | 'tight' | 'short';

/** v2: the verdict, with 'over-limit' when a receiver or the boundary would be over its limit. */
export type Outcome = 'clear' | 'tight' | 'over-limit' | 'short';

/** Ranking order of outcomes, best first. */
export const OUTCOME_ORDER: readonly Outcome[] = ['clear', 'tight', 'over-limit', 'short'];

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
	/** v2: one per site receiver, in the site's order; [] without a site. */
	receivers: ReceiverResult[];
	limits: LimitsResult;
	outcome: Outcome;
}

export interface ReceiverResult {
	name: string;
	/** Horizontal distance from the system. */
	distanceM: number;
	offAxisDeg: number;
	/** null when the programme has no such band or no group covers it (band limits). */
	predictedDb: number | null;
	limitDb: number;
	weighting: Weighting;
	bandHz: ReceiverBandHz | null;
	marginDb: number | null;
	maxTargetDb: number | null;
}

export interface LimitsResult {
	/** Every receiver with a margin, and the boundary, within its limit. */
	ok: boolean;
	/** The highest target at the position that keeps every limit; null when nothing limits. */
	maxTargetDb: number | null;
	/** The receiver whose limit binds ('boundary' for the boundary). */
	bindingReceiver: string | null;
}
