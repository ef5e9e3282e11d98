/**
 * Horizontal directivity (contract step 3b): attenuation re on-axis in dB at an off-axis angle,
 * from a table (the group's own pattern, else the loudspeaker's) or, without one, the contract's
 * deliberately cautious default. Tables are checked and their band rows resolved once per group
 * (prepareDirectivity); the hot path then only interpolates.
 */
import { BAND_COUNT, NOMINAL_BAND_CENTRES_HZ, bandIndexOf } from './bands';
import { describe, fail, requireFinite, type Description } from './errors';
import type { Directivity, GroupSpec } from './types';

/**
 * Rear limit R_b of the default pattern, 31.5 … 8000 Hz. Deliberately cautious: real cabinets
 * reject more behind them, so the maker's polar data should be entered.
 */
export const DEFAULT_REAR_LIMIT_DB = [0, 0, 0, 3, 6, 10, 12, 15, 15] as const;

export interface PreparedDirectivity {
	/** Table angles (ascending, 0 … 180), or null for the default pattern. */
	anglesDeg: Float64Array | null;
	/** One row per band index, resolved by the contract's rules (shared rows for absent bands). */
	rows: Float64Array[] | null;
	/** Default pattern: true for subwoofers and dispersion ≥ 360° (no attenuation at any angle). */
	omni: boolean;
	dispersionHDeg: number;
}

/** Checks a table: angles start at 0, end at 180 and ascend; every row has one value per angle. */
export function checkDirectivity(table: Directivity, label: Description): void {
	const what = () => `${describe(label)}: directivity table`;
	if (table === null || typeof table !== 'object')
		fail(`${what()} must give anglesDeg and bandsDb.`);
	const angles = table.anglesDeg;
	if (!Array.isArray(angles) || angles.length < 2)
		fail(`${what()} needs at least the angles 0 and 180 (°).`);
	for (let i = 0; i < angles.length; i++) {
		requireFinite(angles[i], () => `${what()}: angle ${i + 1}`);
		if (i > 0 && !(angles[i] > angles[i - 1]))
			fail(`${what()}: angles must ascend (got ${angles[i - 1]}° then ${angles[i]}°).`);
	}
	if (angles[0] !== 0 || angles[angles.length - 1] !== 180)
		fail(
			`${what()}: angles must start at 0° and end at 180° (got ${angles[0]}° … ${angles[angles.length - 1]}°).`
		);
	const rows = table.bandsDb as Record<string, unknown> | null;
	if (rows === null || typeof rows !== 'object')
		fail(`${what()} is missing its band rows (bandsDb).`);
	for (const key of Object.keys(rows)) {
		const row = rows[key];
		if (row === undefined) continue;
		if (bandIndexOf(Number(key)) < 0)
			fail(
				`${what()}: band "${key}" is not one of the model's octave bands; use ${NOMINAL_BAND_CENTRES_HZ.join(', ')} (Hz).`
			);
		if (!Array.isArray(row) || row.length !== angles.length)
			fail(
				`${what()}: the ${key} Hz row has ${Array.isArray(row) ? row.length : 'no'} values but there are ${angles.length} angles; give one value per angle.`
			);
		for (let i = 0; i < row.length; i++)
			requireFinite(row[i], () => `${what()}: ${key} Hz at ${angles[i]}° (dB)`);
	}
}

/**
 * One row per band: the band's own row, else the nearest band present below it, else the lowest
 * band present. null when the table has no rows at all.
 */
function resolveRows(table: Directivity): Float64Array[] | null {
	const present: (Float64Array | null)[] = NOMINAL_BAND_CENTRES_HZ.map((hz) => {
		const row = table.bandsDb[hz];
		return row === undefined ? null : Float64Array.from(row);
	});
	const lowest = present.find((row) => row !== null);
	if (lowest === undefined || lowest === null) return null;
	const rows: Float64Array[] = new Array(BAND_COUNT);
	let below: Float64Array | null = null;
	for (let b = 0; b < BAND_COUNT; b++) {
		below = present[b] ?? below;
		rows[b] = below ?? lowest;
	}
	return rows;
}

/** The group's table (else the loudspeaker's), checked and resolved, or the default pattern. */
export function prepareDirectivity(group: GroupSpec, label: Description): PreparedDirectivity {
	const table = group.directivity ?? group.loudspeaker.directivity;
	const speaker = group.loudspeaker;
	const omni = speaker.kind === 'subwoofer' || speaker.dispersionHDeg >= 360;
	if (table !== undefined) {
		checkDirectivity(table, label);
		const rows = resolveRows(table);
		// A table without any band row carries no data: the default pattern applies.
		if (rows !== null)
			return {
				anglesDeg: Float64Array.from(table.anglesDeg),
				rows,
				omni,
				dispersionHDeg: speaker.dispersionHDeg
			};
	}
	return { anglesDeg: null, rows: null, omni, dispersionHDeg: speaker.dispersionHDeg };
}

/** Any angle folded into 0 … 180° (patterns are symmetric left/right and repeat every 360°). */
export function foldAngleDeg(angleDeg: number): number {
	const wrapped = (((angleDeg + 180) % 360) + 360) % 360;
	return Math.abs(wrapped - 180);
}

/**
 * Attenuation (dB) in every band at off-axis angle φ (0 … 180°), written into `out`.
 * Table: linear in angle between the table's angles. Default: min(6·(2φ/dispersionH)², R_b).
 */
export function fillDirectivity(d: PreparedDirectivity, phiDeg: number, out: Float64Array): void {
	if (d.rows !== null) {
		const angles = d.anglesDeg!;
		let k = 0;
		while (k < angles.length - 2 && angles[k + 1] < phiDeg) k++;
		const t = (phiDeg - angles[k]) / (angles[k + 1] - angles[k]);
		for (let b = 0; b < BAND_COUNT; b++) {
			const row = d.rows[b];
			out[b] = row[k] + t * (row[k + 1] - row[k]);
		}
		return;
	}
	if (d.omni) {
		out.fill(0);
		return;
	}
	const ratio = (2 * phiDeg) / d.dispersionHDeg;
	const falloff = 6 * ratio * ratio;
	for (let b = 0; b < BAND_COUNT; b++)
		out[b] = falloff < DEFAULT_REAR_LIMIT_DB[b] ? falloff : DEFAULT_REAR_LIMIT_DB[b];
}

const ONE_GROUP = new Float64Array(BAND_COUNT);

/** Contract function: attenuation re on-axis (dB) of a group in one band at an off-axis angle. */
export function directivityDb(group: GroupSpec, bandHz: number, offAxisDeg: number): number {
	if (group === null || typeof group !== 'object' || typeof group.loudspeaker !== 'object')
		fail('directivityDb needs a group with its loudspeaker.');
	const band = bandIndexOf(bandHz);
	if (band < 0)
		fail(
			`Band ${bandHz} Hz is not one of the model's octave bands; use ${NOMINAL_BAND_CENTRES_HZ.join(', ')}.`
		);
	const angle = requireFinite(offAxisDeg, 'Off-axis angle (°)');
	const dispersion = group.loudspeaker.dispersionHDeg;
	if (!(dispersion > 0))
		fail(`Horizontal dispersion must be greater than zero (got ${dispersion}).`);
	fillDirectivity(prepareDirectivity(group, 'Group'), foldAngleDeg(angle), ONE_GROUP);
	return ONE_GROUP[band];
}
