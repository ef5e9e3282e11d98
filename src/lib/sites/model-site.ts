/** Turns a stored or entered site into the acoustic model's `Site` (shared/acoustics.md, v2). Pure. */
import type { Receiver, Site } from '../acoustics';
import type { Ground, InlineSiteInput } from '../schemas/sites';

/** ISO 9613-2 §7.3.1: G = 0 hard ground (paving, water), 1 porous (grass, farmland), mixed in between. */
export const GROUND_FACTORS: Record<Exclude<Ground, 'custom' | 'none'>, number> = { hard: 0, mixed: 0.5, porous: 1 };

export const GROUND_LABELS: Record<Ground, string> = {
	hard: 'Hard (paving, water), G = 0',
	mixed: 'Mixed, G = 0.5',
	porous: 'Porous (grass, soil), G = 1',
	custom: 'A G value of my own',
	none: 'No ground term'
};

/** The G the model uses; null means "leave the ground term out". */
export function groundFactorOf(ground: Ground, groundFactor: number | null): number | null {
	if (ground === 'none') return null;
	if (ground === 'custom') return groundFactor;
	return GROUND_FACTORS[ground];
}

type SiteLike = Pick<InlineSiteInput, 'ground' | 'groundFactor' | 'aimDeg' | 'positionHeightM' | 'allowanceDb' | 'receivers'>;

export function toModelSite(site: SiteLike): Site {
	return {
		aimDeg: site.aimDeg % 360,
		groundFactor: groundFactorOf(site.ground, site.groundFactor),
		positionHeightM: site.positionHeightM,
		allowanceDb: site.allowanceDb,
		receivers: site.receivers.map((r): Receiver => {
			const receiver: Receiver = { name: r.name, x: r.x, y: r.y, heightM: r.heightM, limitDb: r.limitDb, weighting: r.weighting };
			// A band limit is unweighted (contract step 9): the weighting stored beside it is not used.
			if (r.bandHz !== null) return { ...receiver, weighting: 'Z', bandHz: r.bandHz };
			return receiver;
		})
	};
}

/** How a receiver's limit reads: "55 dB(A)", "70 dB at 63 Hz". */
export function limitLabel(r: { limitDb: number; weighting: string; bandHz?: number | null }): string {
	return r.bandHz ? `${r.limitDb} dB at ${r.bandHz} Hz` : `${r.limitDb} dB(${r.weighting})`;
}

/** Horizontal distance (m) and bearing (degrees clockwise from north) of a point from the system. */
export function distanceAndBearing(x: number, y: number): { distanceM: number; bearingDeg: number } {
	const bearing = (Math.atan2(x, y) * 180) / Math.PI;
	return { distanceM: Math.hypot(x, y), bearingDeg: (bearing + 360) % 360 };
}
