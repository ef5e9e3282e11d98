/**
 * Checks a Site (contract step 3b) and fills its defaults, so the hot path reads plain numbers.
 * Every message names the field and what to fix, for an API to answer 422 as it is.
 */
import { fail, requireFinite } from './errors';
import { checkGroundFactor } from './ground';
import { assertWeighting } from './weighting';
import type { Receiver, Site } from './types';

/** Height of the position, receivers, the boundary point and grid points unless given. */
export const DEFAULT_LISTENING_HEIGHT_M = 1.5;

export interface CheckedSite {
	aimDeg: number;
	groundFactor: number | null;
	positionHeightM: number;
	allowanceDb: number;
	receivers: readonly Receiver[];
}

/** The site levelGrid uses without one: aimed north, no ground term, no receivers (step 10). */
export const GRID_DEFAULT_SITE: CheckedSite = Object.freeze({
	aimDeg: 0,
	groundFactor: null,
	positionHeightM: DEFAULT_LISTENING_HEIGHT_M,
	allowanceDb: 0,
	receivers: Object.freeze([])
});

export function checkHeight(value: unknown, what: string): number {
	if (value === undefined) return DEFAULT_LISTENING_HEIGHT_M;
	const h = requireFinite(value, what);
	if (h < 0) fail(`${what} cannot be negative (got ${h}).`);
	return h;
}

export function checkSite(site: Site): CheckedSite {
	if (site === null || typeof site !== 'object')
		fail('Site must give aimDeg, groundFactor and receivers.');
	const aimDeg = requireFinite(site.aimDeg, 'Site aim (° from north)');
	const groundFactor =
		site.groundFactor === null
			? null
			: checkGroundFactor(site.groundFactor, 'Site ground factor G');
	const positionHeightM = checkHeight(site.positionHeightM, 'Height of the position (m)');
	let allowanceDb = 0;
	if (site.allowanceDb !== undefined) {
		allowanceDb = requireFinite(site.allowanceDb, 'Site allowance (dB)');
		if (allowanceDb < 0)
			fail(
				`Site allowance cannot be negative (got ${allowanceDb} dB); it is added for weather and inversions.`
			);
	}
	if (!Array.isArray(site.receivers)) fail('Site receivers must be a list (it may be empty).');
	for (let i = 0; i < site.receivers.length; i++) checkReceiver(site.receivers[i], i);
	return { aimDeg, groundFactor, positionHeightM, allowanceDb, receivers: site.receivers };
}

function checkReceiver(receiver: Receiver, index: number): void {
	const label = `Receiver ${index + 1}`;
	if (receiver === null || typeof receiver !== 'object') fail(`${label} is missing.`);
	if (typeof receiver.name !== 'string' || receiver.name.trim() === '')
		fail(`${label} needs a name.`);
	const named = `Receiver "${receiver.name}"`;
	requireFinite(receiver.x, named, 'x (m east)');
	requireFinite(receiver.y, named, 'y (m north)');
	checkHeight(receiver.heightM, `${named}: height (m)`);
	requireFinite(receiver.limitDb, named, 'limit (dB)');
	assertWeighting(receiver.weighting, `${named} limit`);
	if (receiver.bandHz !== undefined && receiver.bandHz !== 63 && receiver.bandHz !== 125)
		fail(
			`${named}: a band limit must be on the 63 Hz or 125 Hz band (got ${String(receiver.bandHz)}).`
		);
}

interface SiteEntry {
	receiversRef: readonly Receiver[];
	receiverRefs: Receiver[];
	aimDeg: unknown;
	groundFactor: unknown;
	positionHeightM: unknown;
	allowanceDb: unknown;
	checked: CheckedSite;
}

const CHECKED_SITES = new WeakMap<object, SiteEntry>();

/**
 * checkSite, kept by object identity: the same CheckedSite object comes back while the site's own
 * numbers, its receivers list and every receiver object are unchanged, so caches keyed by it (the
 * site geometry in placement.ts) stay valid. A receiver edited in place must be replaced by a new
 * object to be seen (as a package's groups).
 */
export function checkSiteOnce(site: Site): CheckedSite {
	if (site !== null && typeof site === 'object') {
		const entry = CHECKED_SITES.get(site);
		if (entry !== undefined && sameSite(entry, site)) return entry.checked;
	}
	const checked = checkSite(site);
	CHECKED_SITES.set(site, {
		receiversRef: site.receivers,
		receiverRefs: [...site.receivers],
		aimDeg: site.aimDeg,
		groundFactor: site.groundFactor,
		positionHeightM: site.positionHeightM,
		allowanceDb: site.allowanceDb,
		checked
	});
	return checked;
}

function sameSite(entry: SiteEntry, site: Site): boolean {
	if (
		entry.aimDeg !== site.aimDeg ||
		entry.groundFactor !== site.groundFactor ||
		entry.positionHeightM !== site.positionHeightM ||
		entry.allowanceDb !== site.allowanceDb ||
		entry.receiversRef !== site.receivers ||
		entry.receiverRefs.length !== site.receivers.length
	)
		return false;
	for (let i = 0; i < entry.receiverRefs.length; i++)
		if (entry.receiverRefs[i] !== site.receivers[i]) return false;
	return true;
}
