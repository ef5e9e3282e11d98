/**
 * The package's field on one site, kept between evaluations (issue 10's bench): everything that
 * depends on where things stand but not on the request's target, weighting or programme. Per
 * (prepared package, checked site, air): each receiver's distance, off-axis angle, band and energy
 * sums (slant distances, directivity, ISO 9613-2 ground, air absorption and spreading, see
 * fillEnergy); the position's capability and group contributions at the last distance asked; the
 * boundary point's sums at the last distance asked. An evaluation then only applies the drive.
 * The values are fillEnergy's own, so cached and fresh results are identical to the bit.
 * Kept inside the prepared package (dropped with it) and keyed by the CheckedSite object, which
 * checkSiteOnce replaces whenever the site's numbers, receivers list or a receiver object change.
 */
import type { AirConstants } from './absorption';
import { BAND_COUNT, bandIndexOf } from './bands';
import { energyToLevels, fillEnergy, type Environment } from './field';
import { offAxisDeg } from './geometry';
import type { PreparedPackage } from './groups';
import { DEFAULT_LISTENING_HEIGHT_M, type CheckedSite } from './site';

export interface ReceiverField {
	distanceM: number;
	offAxisDeg: number;
	/** Band index of a band limit, else −1. */
	band: number;
	/** fillEnergy's sums with all absorption inside (absorbAll), every band. */
	energy: Float64Array;
}

export interface SiteField {
	air: AirConstants;
	receivers: ReceiverField[];
	/** The position at positionDistanceM: capability (dB) and contributions, as drivePackage needs. */
	positionDistanceM: number;
	positionContinuousDb: Float64Array;
	positionPeakDb: Float64Array;
	positionContributions: Float64Array;
	/** The boundary point (on the aim bearing, 1.5 m high) at boundaryDistanceM. */
	boundaryDistanceM: number;
	boundaryEnergy: Float64Array;
}

/** The site's environment for fillEnergy under this air. */
function environment(site: CheckedSite, air: AirConstants): Environment {
	return {
		alphas: air.alphas,
		inverseC: air.inverseC,
		freeField: false,
		groundFactor: site.groundFactor
	};
}

/** The cached field of this package on this site under this air (built on first use). */
export function siteField(
	prepared: PreparedPackage,
	site: CheckedSite,
	air: AirConstants
): SiteField {
	const cached = prepared.siteFields.get(site);
	if (cached !== undefined && cached.air === air) return cached;
	const env = environment(site, air);
	const receivers = site.receivers.map((r): ReceiverField => {
		const distanceM = Math.sqrt(r.x * r.x + r.y * r.y);
		const phi = offAxisDeg(r.x, r.y, site.aimDeg);
		const energy = new Float64Array(BAND_COUNT);
		const heightM = r.heightM ?? DEFAULT_LISTENING_HEIGHT_M;
		fillEnergy(prepared.groups, env, distanceM, phi, heightM, energy, null, null, true);
		return {
			distanceM,
			offAxisDeg: phi,
			band: r.bandHz === undefined ? -1 : bandIndexOf(r.bandHz),
			energy
		};
	});
	const field: SiteField = {
		air,
		receivers,
		positionDistanceM: Number.NaN,
		positionContinuousDb: new Float64Array(BAND_COUNT),
		positionPeakDb: new Float64Array(BAND_COUNT),
		positionContributions: new Float64Array(prepared.groups.length * BAND_COUNT),
		boundaryDistanceM: Number.NaN,
		boundaryEnergy: new Float64Array(BAND_COUNT)
	};
	prepared.siteFields.set(site, field);
	return field;
}

/** Fills the position's capability (dB) and contributions at distanceM, unless already there. */
export function positionOnSite(
	field: SiteField,
	prepared: PreparedPackage,
	site: CheckedSite,
	distanceM: number
): void {
	if (field.positionDistanceM === distanceM) return;
	const env = environment(site, field.air);
	const rRef = fillEnergy(
		prepared.groups,
		env,
		distanceM,
		0,
		site.positionHeightM,
		field.positionContinuousDb,
		field.positionPeakDb,
		field.positionContributions
	);
	energyToLevels(field.positionContinuousDb, env.alphas, rRef);
	energyToLevels(field.positionPeakDb, env.alphas, rRef);
	field.positionDistanceM = distanceM;
}

/** The boundary point's energy sums at distanceM (on the aim bearing, 1.5 m high). */
export function boundaryOnSite(
	field: SiteField,
	prepared: PreparedPackage,
	site: CheckedSite,
	distanceM: number
): Float64Array {
	if (field.boundaryDistanceM !== distanceM) {
		const env = environment(site, field.air);
		fillEnergy(
			prepared.groups,
			env,
			distanceM,
			0,
			DEFAULT_LISTENING_HEIGHT_M,
			field.boundaryEnergy,
			null,
			null,
			true
		);
		field.boundaryDistanceM = distanceM;
	}
	return field.boundaryEnergy;
}
