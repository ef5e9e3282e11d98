/**
 * Kestrel Yard Audio's invented gear data for the v2 acoustic model: per-band response, power
 * compression and horizontal polar tables for each demo model (by the codes of data/inventory.ts),
 * placement of each demo package's groups, and one package with subwoofers in a cardioid arrangement.
 * Plausible for cabinets of each class, not any real product's measurements.
 */
import { NOMINAL_BANDS, type NominalBandKey } from '../../src/lib/schemas/programmes';
import type { BandResponse, DirectivityTable } from '../../src/lib/schemas/directivity';
import { loudspeakers } from './inventory';

const ANGLES = [0, 30, 60, 90, 120, 150, 180];
const roundHalf = (x: number) => Math.round(x * 2) / 2 + 0; // + 0 turns −0 into 0

/**
 * Low-frequency roll-off of a vented box: a 4th-order high-pass (24 dB per octave) with its −3 dB point
 * at the cabinet's stated low limit, rounded to 0.5 dB (common practice for the shape).
 */
function rollOff(lowHz: number): BandResponse {
	return Object.fromEntries(NOMINAL_BANDS.map((band) => [band, roundHalf(-10 * Math.log10(1 + (lowHz / Number(band)) ** 8))]));
}

/** How far behind the cabinet each band is rejected (dB at 180°), for a horn-loaded top and a line element. */
const REAR_TOP = [0.5, 1, 2, 4, 8, 13, 17, 19, 21];
const REAR_LINE = [0.5, 1.5, 3, 6, 10, 15, 19, 22, 24];
/** Below a few hundred hertz the box is too small to hold its pattern: coverage widens by these factors. */
const WIDENING = [8, 8, 6, 3, 1.6, 1.15, 1, 1, 1];

/**
 * A smooth polar table from the nominal −6 dB angle: attenuation rises with the square of the angle,
 * 6 dB at half the (band-widened) coverage angle, and levels off towards the band's rear rejection,
 * rear · (1 − e^(−c·(φ/half)²)) with c chosen for the 6 dB point. A band that never reaches 6 dB rises as
 * rear · (1 − cos φ)/2 instead.
 */
function polar(dispersionHDeg: number, rear: number[]): DirectivityTable {
	const bandsDb = Object.fromEntries(
		NOMINAL_BANDS.map((band, i) => {
			const half = Math.min(dispersionHDeg * WIDENING[i], 720) / 2;
			const r = rear[i];
			const c = r > 6 && half < 180 ? -Math.log(1 - 6 / r) : 0;
			const at = (a: number) => (c > 0 ? r * (1 - Math.exp(-c * (a / half) ** 2)) : (r * (1 - Math.cos((a * Math.PI) / 180))) / 2);
			return [band, ANGLES.map((a) => roundHalf(at(a)))];
		})
	) as Record<NominalBandKey, number[]>;
	return { anglesDeg: ANGLES, bandsDb };
}

/** A subwoofer is nearly omnidirectional: a decibel or two behind at most, rising smoothly. */
function nearlyOmni(rearDb: Partial<Record<NominalBandKey, number>>): DirectivityTable {
	const bandsDb = Object.fromEntries(
		Object.entries(rearDb).map(([band, rear]) => [band, ANGLES.map((a) => roundHalf((rear * (1 - Math.cos((a * Math.PI) / 180))) / 2))])
	);
	return { anglesDeg: ANGLES, bandsDb };
}

const COMPRESSION_DB: Record<string, number> = { CV5: 2.5, CV8: 2.5, CV10: 2, MR12: 2, MR15: 1.5, DN18: 2.5, DN218: 2, TS8: 2, TS12: 1.5, LW12: 2, LW15: 2 };

export const gearByCode = new Map(
	loudspeakers.map((s) => [
		s.code,
		{
			name: s.name,
			maker: s.maker,
			bandResponseDb: rollOff(s.lowHz),
			compressionDb: COMPRESSION_DB[s.code],
			directivity:
				s.kind === 'subwoofer'
					? nearlyOmni({ '31.5': 0.5, '63': 1, '125': 2.5 })
					: polar(s.dispersionHDeg, s.kind === 'line-array-element' ? REAR_LINE : REAR_TOP)
		}
	])
);

/** Group placement by package slug, in group order: ground-stacked subs, tops on stands or subs, flown hangs. */
export const placements: Record<string, { heightM: number; spacingM: number | null }[]> = {
	'speech-small': [{ heightM: 2.5, spacingM: 6 }],
	'acoustic-stage': [{ heightM: 2.5, spacingM: 8 }, { heightM: 0.6, spacingM: 8 }, { heightM: 0.3, spacingM: null }],
	'band-medium': [{ heightM: 2.5, spacingM: 10 }, { heightM: 0.6, spacingM: 10 }, { heightM: 0.3, spacingM: null }],
	'club-rig': [{ heightM: 2.5, spacingM: 8 }, { heightM: 0.6, spacingM: 8 }],
	'line-array-small': [{ heightM: 7, spacingM: 12 }, { heightM: 0.6, spacingM: 12 }],
	'line-array-large': [{ heightM: 7, spacingM: 16 }, { heightM: 0.6, spacingM: 16 }, { heightM: 1.2, spacingM: 12 }]
};

/**
 * Subwoofers in a cardioid arrangement (one reversed, delayed cabinet in each block of three): the
 * group's own pattern keeps the front and rejects the rear strongly at 63 and 125 Hz, less at 31.5 Hz.
 */
export const cardioidSubs: DirectivityTable = {
	anglesDeg: ANGLES,
	bandsDb: {
		'31.5': [0, 0.5, 1.5, 3, 5, 6.5, 7],
		'63': [0, 0.5, 2, 5, 10, 16, 20],
		'125': [0, 1, 3, 6, 11, 15, 18]
	}
};

export const cardioidPackage = {
	name: 'Line array with cardioid subs',
	slug: 'line-array-cardioid',
	description: 'Two flown hangs of twelve large elements over cardioid dual-18 sub blocks, for sites with neighbours behind the stage.',
	groups: [
		{ speaker: 'TS12', count: 12, stacks: 2, amp: 'Q50', cabinetsPerChannel: 3, flown: true, heightM: 7, spacingM: 16, directivity: null },
		{ speaker: 'DN218', count: 6, stacks: 2, amp: 'Q50', cabinetsPerChannel: 1, flown: false, heightM: 0.6, spacingM: 16, directivity: cardioidSubs }
	]
};
