// Contract steps 3b, 8 and 9 with a site: position geometry, receivers, limits and outcome.
import { describe, expect, it } from 'vitest';
import { FLAT_OCTAVES, group, request } from '../../../tests/helpers/acoustics/fixtures';
import { airAbsorption } from './absorption';
import { directivityDb } from './directivity';
import { evaluatePackage } from './evaluate';
import { groundAttenuation } from './ground';
import { compareOutcomes } from './receivers';
import type { GroupSpec, Outcome, QuoteRequest, Receiver, Site } from './types';

const AIR = { temperatureC: 20, humidityPct: 70 };
const alpha1k = airAbsorption(1000, AIR);
const holtAt1m = 92 + 10 * Math.log10(160); // Holt (Stereophile): 114 dB at 1 m
const site = (overrides: Partial<Site> = {}): Site => ({
	aimDeg: 0,
	groundFactor: null,
	receivers: [],
	...overrides
});
const receiver = (overrides: Partial<Receiver> = {}): Receiver => ({
	name: 'Fence',
	x: 0,
	y: 100,
	limitDb: 75,
	weighting: 'Z',
	...overrides
});
const one = (g: GroupSpec, r: Partial<QuoteRequest> = {}) =>
	evaluatePackage({ groups: [g] }, request(r));

describe('step 3b: the position on a site', () => {
	it('flat site, no ground term, group and position both 1.5 m high: the same capability as free field', () => {
		const free = one(group());
		const onSite = one(group(), { site: site({ aimDeg: 137 }) });
		expect(onSite.bands[0].capabilityDb).toBeCloseTo(free.bands[0].capabilityDb, 12);
		expect(onSite.receivers).toEqual([]);
	});

	it('slant distance r = √(d_p² + Δh²) in the laws and in the air absorption: hang 11.5 m up, position 10 m away at 1.5 m', () => {
		const r = Math.hypot(10, 10);
		const result = one(group({ heightM: 11.5 }), { site: site() });
		expect(result.bands[0].capabilityDb).toBeCloseTo(
			holtAt1m - 20 * Math.log10(r) - alpha1k * r,
			10
		);
		// Without a site group heights are ignored (v1 free field).
		expect(one(group({ heightM: 11.5 })).bands[0].capabilityDb).toBeCloseTo(
			holtAt1m - 20 - alpha1k * 10,
			10
		);
	});

	it('positionHeightM sets the height of the position', () => {
		const result = one(group({ heightM: 1.5 }), { site: site({ positionHeightM: 11.5 }) });
		const r = Math.hypot(10, 10);
		expect(result.bands[0].capabilityDb).toBeCloseTo(
			holtAt1m - 20 * Math.log10(r) - alpha1k * r,
			10
		);
	});

	it('ground attenuation (ISO 9613-2 A_gr) comes off the capability at the position', () => {
		const hard = one(group({ heightM: 3 }), { site: site({ groundFactor: 1 }) });
		const none = one(group({ heightM: 3 }), { site: site() });
		expect(none.bands[0].capabilityDb - hard.bands[0].capabilityDb).toBeCloseTo(
			groundAttenuation(1000, 3, 1.5, 10, 1),
			12
		);
	});

	it("the position is on axis: a table's 0° value applies there", () => {
		const g = group({ directivity: { anglesDeg: [0, 180], bandsDb: { 1000: [2, 20] } } });
		expect(
			one(group(), { site: site() }).bands[0].capabilityDb -
				one(g, { site: site() }).bands[0].capabilityDb
		).toBeCloseTo(2, 12);
	});

	it('coverage uses the horizontal distance to the position (horizontal dispersion spreads in plan)', () => {
		const high = one(group({ heightM: 20 }), { site: site(), audienceWidthM: 20 });
		expect(high.coverage.widthM).toBeCloseTo(20, 9);
	});
});

describe('step 9: receivers', () => {
	it('on axis, same heights, no ground: 90 dB(Z) at 10 m → 90 − 20 − α·90 at 100 m (inverse square law, ISO 9613-1)', () => {
		const r = one(group(), { site: site({ receivers: [receiver()] }) });
		const predicted = 90 - 20 - alpha1k * 90;
		expect(r.receivers).toEqual([
			{
				name: 'Fence',
				distanceM: 100,
				offAxisDeg: 0,
				predictedDb: expect.closeTo(predicted, 10),
				limitDb: 75,
				weighting: 'Z',
				bandHz: null,
				marginDb: expect.closeTo(75 - predicted, 10),
				maxTargetDb: expect.closeTo(90 + 75 - predicted, 10)
			}
		]);
	});

	it('behind the system the default directivity takes R_1k = 10 dB off; beside it at 90° the 90° cabinet loses min(6·(2·90/90)², 10) = 10 dB', () => {
		const front = receiver({ name: 'Front', x: 0, y: 100 });
		const back = receiver({ name: 'Back', x: 0, y: -100 });
		const side = receiver({ name: 'Side', x: 100, y: 0 });
		const [f, b, s] = one(group(), { site: site({ receivers: [front, back, side] }) }).receivers;
		expect(b.offAxisDeg).toBeCloseTo(180, 10);
		expect(f.predictedDb! - b.predictedDb!).toBeCloseTo(10, 10);
		expect(f.predictedDb! - s.predictedDb!).toBeCloseTo(directivityDb(group(), 1000, 90), 10);
	});

	it('the allowance is added to every receiver and to the boundary, not to the capability', () => {
		const base = one(group(), {
			site: site({ receivers: [receiver()] }),
			boundary: { distanceM: 50, limitDb: 80, weighting: 'Z' }
		});
		const withAllowance = one(group(), {
			site: site({ receivers: [receiver()], allowanceDb: 5 }),
			boundary: { distanceM: 50, limitDb: 80, weighting: 'Z' }
		});
		expect(withAllowance.receivers[0].predictedDb! - base.receivers[0].predictedDb!).toBeCloseTo(
			5,
			12
		);
		expect(withAllowance.boundary!.predictedDb - base.boundary!.predictedDb).toBeCloseTo(5, 12);
		expect(withAllowance.headroomDb).toBe(base.headroomDb);
	});

	it('a band limit (63 Hz) is that band’s unweighted level; null when the programme lacks it or no group covers it', () => {
		const programme = { bandsDb: { 63: 0, 1000: 0 }, crestFactorDb: 12 };
		const band = receiver({ name: 'Houses', bandHz: 63, weighting: 'C' });
		const r = one(group({}, { lowHz: 40 }), { programme, site: site({ receivers: [band] }) });
		// Q_63 = 90 − 3.01 dB (two equal bands make 90 dB(Z)); point source from 10 m to 100 m.
		const q63 = 90 - 10 * Math.log10(2);
		const alpha63 = airAbsorption(1000 * 10 ** -1.2, AIR);
		expect(r.receivers[0].predictedDb).toBeCloseTo(q63 - 20 - alpha63 * 90, 10);
		expect(r.receivers[0].bandHz).toBe(63);
		const notInProgramme = one(group(), { site: site({ receivers: [band] }) });
		const notCovered = one(group({}, { lowHz: 100 }), {
			programme,
			site: site({ receivers: [band] })
		});
		for (const result of [notInProgramme, notCovered])
			expect(result.receivers[0]).toMatchObject({
				predictedDb: null,
				marginDb: null,
				maxTargetDb: null
			});
		expect(notCovered.limits).toEqual({ ok: true, maxTargetDb: null, bindingReceiver: null });
	});

	it('step 8 with a site: the boundary is the point at D on the aim bearing, 1.5 m high, with the site effects', () => {
		const s = site({ aimDeg: 45, groundFactor: 0.5, receivers: [] });
		const g = group({ heightM: 6 });
		const atBoundary = one(g, {
			site: s,
			boundary: { distanceM: 200, limitDb: 70, weighting: 'A' }
		});
		const asReceiver = one(g, {
			site: {
				...s,
				receivers: [
					receiver({
						x: 200 * Math.sin(Math.PI / 4),
						y: 200 * Math.cos(Math.PI / 4),
						weighting: 'A',
						limitDb: 70
					})
				]
			}
		});
		expect(atBoundary.boundary!.predictedDb).toBeCloseTo(asReceiver.receivers[0].predictedDb!, 9);
	});
});

describe('step 9: limits and outcome', () => {
	const twoReceivers = [
		receiver({ name: 'Near house', x: 0, y: 60, limitDb: 80 }),
		receiver({ name: 'Far house', x: 0, y: 300, limitDb: 60 })
	];

	it('the receiver with the smallest maxTargetDb binds; ok when every margin ≥ 0', () => {
		const r = one(group(), { site: site({ receivers: twoReceivers }) });
		const [near, far] = r.receivers;
		expect(far.maxTargetDb!).toBeLessThan(near.maxTargetDb!);
		expect(r.limits).toEqual({
			ok: far.marginDb! >= 0 && near.marginDb! >= 0,
			maxTargetDb: far.maxTargetDb,
			bindingReceiver: 'Far house'
		});
	});

	it('the boundary counts as a receiver named "boundary"', () => {
		const r = one(group(), {
			site: site({ receivers: twoReceivers }),
			boundary: { distanceM: 40, limitDb: 60, weighting: 'Z' }
		});
		expect(r.limits.bindingReceiver).toBe('boundary');
		expect(r.limits.maxTargetDb).toBe(r.boundary!.maxTargetDb);
		expect(r.limits.ok).toBe(false);
	});

	it('running at limits.maxTargetDb puts the binding receiver exactly on its limit', () => {
		const first = one(group(), { site: site({ receivers: twoReceivers }) });
		const atMax = one(group(), {
			targetDb: first.limits.maxTargetDb!,
			site: site({ receivers: twoReceivers })
		});
		expect(atMax.receivers[1].marginDb).toBeCloseTo(0, 9);
		expect(atMax.limits.ok).toBe(true);
	});

	it("outcome: the verdict when limits are ok; 'over-limit' instead of clear or tight when they are not; short stays short", () => {
		const quiet = [receiver({ limitDb: 100 })];
		const loud = [receiver({ limitDb: 40 })];
		expect(one(group(), { site: site({ receivers: quiet }) }).outcome).toBe('clear');
		const over = one(group(), { site: site({ receivers: loud }) });
		expect([over.verdict, over.limits.ok, over.outcome]).toEqual(['clear', false, 'over-limit']);
		const tight = one(group(), { site: site({ receivers: loud }), marginDb: 6 });
		expect([tight.verdict, tight.outcome]).toEqual(['tight', 'over-limit']);
		const short = one(group(), { site: site({ receivers: loud }), targetDb: 130 });
		expect([short.verdict, short.outcome]).toEqual(['short', 'short']);
	});

	it('without receivers or boundary: limits ok, nothing binds', () => {
		expect(one(group(), { site: site() }).limits).toEqual({
			ok: true,
			maxTargetDb: null,
			bindingReceiver: null
		});
		expect(one(group()).limits).toEqual({ ok: true, maxTargetDb: null, bindingReceiver: null });
	});

	it('compareOutcomes ranks clear → tight → over-limit → short', () => {
		const outcomes: Outcome[] = ['short', 'over-limit', 'clear', 'tight', 'short', 'clear'];
		expect([...outcomes].sort(compareOutcomes)).toEqual([
			'clear',
			'clear',
			'tight',
			'over-limit',
			'short',
			'short'
		]);
	});
});

describe('v2 step 2 and 3 details', () => {
	it('band response raises both sides in its band only', () => {
		const programme = FLAT_OCTAVES;
		const flat = one(group(), { programme });
		const shaped = one(group({}, { bandResponseDb: { 63: -6, 8000: 2 } }), { programme });
		flat.bands.forEach((band, n) => {
			const shift = band.hz === 63 ? -6 : band.hz === 8000 ? 2 : 0;
			if (band.capabilityDb === -Infinity) return;
			expect(shaped.bands[n].capabilityDb - band.capabilityDb).toBeCloseTo(shift, 12);
			expect(shaped.bands[n].capabilityPeakDb - band.capabilityPeakDb).toBeCloseTo(shift, 12);
		});
	});

	it('contract step 3: any distance below 1 m is taken as 1 m', () => {
		expect(one(group(), { distanceM: 0.25 }).bands[0].capabilityDb).toBe(
			one(group(), { distanceM: 1 }).bands[0].capabilityDb
		);
	});
});

describe('sites that cannot be evaluated', () => {
	const bad = (s: unknown) => () => one(group(), { site: s as Site });
	it('G outside 0 … 1, a receiver without a limit or name, a band limit other than 63/125 Hz, a negative allowance', () => {
		expect(bad(site({ groundFactor: 1.5 }))).toThrow(
			/Site ground factor G must be between 0 \(hard\) and 1 \(porous\)/
		);
		expect(
			bad(site({ receivers: [{ ...receiver(), limitDb: undefined }] as unknown as Receiver[] }))
		).toThrow(/Receiver "Fence": limit \(dB\) must be a finite number/);
		expect(bad(site({ receivers: [receiver({ name: '' })] }))).toThrow(/Receiver 1 needs a name/);
		expect(bad(site({ receivers: [receiver({ bandHz: 250 as 63 })] }))).toThrow(
			/63 Hz or 125 Hz band/
		);
		expect(bad(site({ allowanceDb: -3 }))).toThrow(/allowance cannot be negative/);
		expect(bad(site({ aimDeg: Number.NaN }))).toThrow(/Site aim/);
		expect(bad({ aimDeg: 0, groundFactor: null })).toThrow(/receivers must be a list/);
	});

	it('a group height that is negative', () => {
		expect(() => one(group({ heightM: -1 }), { site: site() })).toThrow(
			/height above ground \(m\) cannot be negative/
		);
	});
});
