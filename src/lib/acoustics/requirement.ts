/**
 * The requirement at the position (contract step 4) and the checks on a QuoteRequest.
 * The programme's relative band levels R_b are shifted by one constant K so that their weighted
 * energy sum equals the target: sumLevels(R_b + K + W_b) = targetDb, Q_b = R_b + K.
 */
import { BAND_COUNT, NOMINAL_BAND_CENTRES_HZ } from './bands';
import { fail, requireFinite, requirePositive } from './errors';
import { BAND_WEIGHTINGS_DB, assertWeighting } from './weighting';
import type { Programme, QuoteRequest, Weighting } from './types';

export const DEFAULT_MARGIN_DB = 3;

export interface Requirement {
	/** Indices (into the band arrays) of the programme's bands, ascending. */
	bandIndices: readonly number[];
	/** Q_b, index-aligned with bandIndices: required Leq per band. */
	requiredDb: number[];
	crestFactorDb: number;
}

/** The programme's band indices, ascending; throws when it names no band or a band the model lacks. */
export function programmeBandIndices(programme: Programme): number[] {
	if (
		programme === null ||
		typeof programme !== 'object' ||
		programme.bandsDb === null ||
		typeof programme.bandsDb !== 'object'
	) {
		fail('Programme is missing its band levels.');
	}
	const bands = programme.bandsDb as Record<number, unknown>;
	const indices: number[] = [];
	for (let i = 0; i < BAND_COUNT; i++) {
		const value = bands[NOMINAL_BAND_CENTRES_HZ[i]];
		if (value === undefined) continue;
		requireFinite(value, () => `Programme level at ${NOMINAL_BAND_CENTRES_HZ[i]} Hz (dB)`);
		indices.push(i);
	}
	// Any other key would be a band the model cannot evaluate; refuse it rather than drop it.
	let given = 0;
	for (const key in bands) if (bands[key as unknown as number] !== undefined) given++;
	if (given !== indices.length) {
		const canonical = NOMINAL_BAND_CENTRES_HZ.map(String);
		const unknown = Object.keys(bands).find(
			(key) => bands[key as unknown as number] !== undefined && !canonical.includes(key)
		);
		fail(
			`Programme band "${unknown}" is not one of the model's octave bands; use ${canonical.join(', ')} (Hz).`
		);
	}
	if (indices.length === 0)
		fail('Programme has no bands: give a relative level for at least one octave band.');
	return indices;
}

/** A checked programme: its band indices, relative levels and weighted sums, kept per object. */
interface CheckedProgramme {
	bandsRef: object;
	/** The nine band values as they were when checked (undefined where absent). */
	snapshot: (number | undefined)[];
	crestFactorDb: number;
	bandIndices: number[];
	relativeDb: number[];
	/** 10·lg Σ 10^((R_b + W_b)/10) per weighting, filled when first needed. */
	weightedSumDb: Record<Weighting, number>;
}

const CHECKED = new WeakMap<object, CheckedProgramme>();

function unchanged(entry: CheckedProgramme, programme: Programme): boolean {
	if (entry.bandsRef !== programme.bandsDb || entry.crestFactorDb !== programme.crestFactorDb)
		return false;
	const bands = programme.bandsDb as Record<number, number | undefined>;
	for (let i = 0; i < BAND_COUNT; i++)
		if (bands[NOMINAL_BAND_CENTRES_HZ[i]] !== entry.snapshot[i]) return false;
	return true;
}

/**
 * The programme checked once per object and kept while its nine band values and crest factor are
 * unchanged (a programme is evaluated against every package of a quote and every grid point).
 */
function checkedProgramme(programme: Programme): CheckedProgramme {
	if (programme !== null && typeof programme === 'object') {
		const entry = CHECKED.get(programme);
		if (entry !== undefined && unchanged(entry, programme)) return entry;
	}
	const bandIndices = programmeBandIndices(programme);
	const crestFactorDb = requireFinite(programme.crestFactorDb, 'Programme crest factor (dB)');
	if (crestFactorDb < 0)
		fail(
			`Programme crest factor cannot be negative (got ${crestFactorDb} dB); peak is never below the average.`
		);
	const bands = programme.bandsDb as Record<number, number | undefined>;
	const entry: CheckedProgramme = {
		bandsRef: programme.bandsDb,
		snapshot: NOMINAL_BAND_CENTRES_HZ.map((hz) => bands[hz]),
		crestFactorDb,
		bandIndices,
		relativeDb: bandIndices.map((i) => bands[NOMINAL_BAND_CENTRES_HZ[i]] as number),
		weightedSumDb: { A: Number.NaN, C: Number.NaN, Z: Number.NaN }
	};
	CHECKED.set(programme, entry);
	return entry;
}

/** Q_b for the target in its weighting (step 4). */
export function requirementFor(
	programme: Programme,
	targetDb: number,
	weighting: Weighting
): Requirement {
	const checked = checkedProgramme(programme);
	const { bandIndices, relativeDb } = checked;
	let sumDb = checked.weightedSumDb[weighting];
	if (sumDb !== sumDb) {
		const w = BAND_WEIGHTINGS_DB[weighting];
		let weightedEnergy = 0;
		for (let n = 0; n < bandIndices.length; n++)
			weightedEnergy += Math.pow(10, (relativeDb[n] + w[bandIndices[n]]) / 10);
		sumDb = checked.weightedSumDb[weighting] = 10 * Math.log10(weightedEnergy);
	}
	const offsetDb = targetDb - sumDb;
	const requiredDb: number[] = new Array(bandIndices.length);
	for (let n = 0; n < bandIndices.length; n++) requiredDb[n] = relativeDb[n] + offsetDb;
	return { bandIndices, requiredDb, crestFactorDb: checked.crestFactorDb };
}

/** Checks every field of a request that the model reads; returns nothing, throws a clear Error. */
export function checkRequest(request: QuoteRequest): void {
	if (request === null || typeof request !== 'object') fail('Request is missing.');
	requireFinite(request.targetDb, 'Target level (dB)');
	assertWeighting(request.weighting, 'Target level');
	checkDistance(request.distanceM, 'Distance to the position');
	if (request.audienceWidthM !== undefined) {
		const width = requireFinite(request.audienceWidthM, 'Audience width (m)');
		if (width < 0) fail(`Audience width cannot be negative (got ${width} m).`);
	}
	if (request.marginDb !== undefined) {
		const margin = requireFinite(request.marginDb, 'Safety margin (dB)');
		if (margin < 0) fail(`Safety margin cannot be negative (got ${margin} dB).`);
	}
	if (request.boundary !== undefined) {
		const boundary = request.boundary;
		if (boundary === null || typeof boundary !== 'object')
			fail('Boundary must give distanceM, limitDb and weighting.');
		checkDistance(boundary.distanceM, 'Distance to the boundary');
		requireFinite(boundary.limitDb, 'Boundary limit (dB)');
		assertWeighting(boundary.weighting, 'Boundary limit');
	}
}

export function checkDistance(distanceM: unknown, what: string): number {
	if (typeof distanceM !== 'number' || !Number.isFinite(distanceM) || distanceM <= 0) {
		fail(`${what} must be a positive, finite number of metres (got ${String(distanceM)}).`);
	}
	return requirePositive(distanceM, what);
}
