// The site field cache (placement.ts): a cached evaluation must equal a fresh one to the bit, and
// any replaced receiver, site number, air or distance must be seen. Inputs are invented round numbers.
import { describe, expect, it } from 'vitest';
import { FLAT_OCTAVES, group } from '../../../tests/helpers/acoustics/fixtures';
import { evaluatePackage } from './evaluate';
import type { PackageSpec, QuoteRequest, Receiver } from './types';

const pkg = (): PackageSpec => ({
	groups: [
		group({ heightM: 6, count: 2, stacks: 2, spacingM: 10 }),
		group({ heightM: 0.5 }, { kind: 'subwoofer', lowHz: 30, highHz: 120, dispersionHDeg: 360 })
	]
});
const receivers = (): Receiver[] => [
	{ name: 'North house', x: 20, y: 300, limitDb: 65, weighting: 'A' },
	{ name: 'East yard', x: 250, y: -40, heightM: 4, limitDb: 70, weighting: 'C' },
	{ name: 'Flats', x: -90, y: -200, limitDb: 60, weighting: 'Z', bandHz: 63 }
];
const quote = (): QuoteRequest => ({
	targetDb: 98,
	weighting: 'A',
	distanceM: 25,
	programme: FLAT_OCTAVES,
	air: { temperatureC: 15, humidityPct: 60 },
	boundary: { distanceM: 150, limitDb: 75, weighting: 'A' },
	site: { aimDeg: 30, groundFactor: 0.5, allowanceDb: 2, receivers: receivers() }
});
/** The same inputs as brand-new objects, so no cache applies. */
const fresh = (p: PackageSpec, r: QuoteRequest) =>
	evaluatePackage(structuredClone(p), structuredClone(r));

describe('the site field is kept between evaluations', () => {
	it('a repeated evaluation equals a fresh one (new package and site objects, same values) exactly', () => {
		const p = pkg();
		const r = quote();
		const first = evaluatePackage(p, r);
		const again = evaluatePackage(p, r);
		expect(again).toEqual(first);
		expect(again).toEqual(fresh(p, r));
		// A different target, weighting and programme reuse the geometry and still match.
		const louder: QuoteRequest = { ...r, targetDb: 104, weighting: 'C' };
		expect(evaluatePackage(p, louder)).toEqual(fresh(p, louder));
	});

	it('a new position or boundary distance on the same site matches a fresh evaluation', () => {
		const p = pkg();
		const r = quote();
		evaluatePackage(p, r);
		const moved: QuoteRequest = {
			...r,
			distanceM: 40,
			boundary: { ...r.boundary!, distanceM: 90 }
		};
		const result = evaluatePackage(p, moved);
		expect(result).toEqual(fresh(p, moved));
		expect(result.bands).not.toEqual(evaluatePackage(p, r).bands);
	});

	it('replacing a receiver object changes the result', () => {
		const p = pkg();
		const r = quote();
		const before = evaluatePackage(p, r);
		r.site!.receivers[0] = { ...r.site!.receivers[0], x: 200, y: 200 };
		const after = evaluatePackage(p, r);
		expect(after.receivers[0].predictedDb).not.toBe(before.receivers[0].predictedDb);
		expect(after).toEqual(fresh(p, r));
	});

	it('replacing the receivers list, or changing a site number or the air, is seen', () => {
		const p = pkg();
		const r = quote();
		const before = evaluatePackage(p, r);
		r.site!.receivers = receivers().slice(1);
		expect(evaluatePackage(p, r).receivers.map((x) => x.name)).toEqual(['East yard', 'Flats']);
		r.site!.groundFactor = 1;
		expect(evaluatePackage(p, r)).toEqual(fresh(p, r));
		r.site!.aimDeg = 200;
		expect(evaluatePackage(p, r)).toEqual(fresh(p, r));
		const warm: QuoteRequest = { ...r, air: { temperatureC: 30, humidityPct: 20 } };
		expect(evaluatePackage(p, warm)).toEqual(fresh(p, warm));
		expect(evaluatePackage(p, warm).receivers).not.toEqual(evaluatePackage(p, r).receivers);
		expect(before.receivers).toHaveLength(3);
	});

	it('a receiver edited in place is not seen until it is replaced (documented in index.ts)', () => {
		const p = pkg();
		const r = quote();
		const before = evaluatePackage(p, r);
		r.site!.receivers[1].x = 10;
		expect(evaluatePackage(p, r).receivers[1].predictedDb).toBe(before.receivers[1].predictedDb);
		r.site!.receivers[1] = { ...r.site!.receivers[1] };
		expect(evaluatePackage(p, r)).toEqual(fresh(p, r));
	});
});
