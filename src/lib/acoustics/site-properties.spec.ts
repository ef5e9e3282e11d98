/**
 * Property tests (fast-check) of the v2 site model: physical laws a site prediction must obey and
 * agreements between the model's own entry points.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
	CENTRES,
	groupArb,
	heightsArb,
	packageArb,
	receiverArb,
	requestArb,
	siteArb,
	withHeights
} from '../../../tests/helpers/acoustics/reference';
import { evaluatePackage } from './evaluate';
import { levelGrid } from './grid';
import type { LoudspeakerKind, Receiver, Site } from './types';

const spreading = fc.constantFrom<LoudspeakerKind>('full-range', 'line-array-element', 'monitor');

describe('properties of the site model', () => {
	it('over porous ground (G = 1) at 2 kHz, a receiver moved farther away on the same bearing never gets louder', () => {
		fc.assert(
			fc.property(
				packageArb(spreading),
				heightsArb,
				requestArb,
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 1, max: 3000, noNaN: true }),
				fc.double({ min: 1.001, max: 10, noNaN: true }),
				fc.double({ min: 0, max: 10, noNaN: true }),
				(pkg, heights, req, aimDeg, bearing, near, factor, heightM) => {
					const at = (d: number): Receiver => ({
						name: String(d),
						x: d * Math.sin((bearing * Math.PI) / 180),
						y: d * Math.cos((bearing * Math.PI) / 180),
						heightM,
						limitDb: 60,
						weighting: 'Z'
					});
					const site: Site = { aimDeg, groundFactor: 1, receivers: [at(near), at(near * factor)] };
					const programme = { bandsDb: { 2000: 0 }, crestFactorDb: 6 };
					const r = evaluatePackage(withHeights(pkg, heights), { ...req, programme, site });
					const [closer, farther] = r.receivers.map((x) => x.predictedDb!);
					fc.pre(Number.isFinite(closer));
					expect(farther).toBeLessThanOrEqual(closer + 1e-9);
				}
			)
		);
	});

	it('ISO 9613-2 Table 3: with G = 0 far away every band gains 6 dB over no ground term (the drive at the position taken out)', () => {
		fc.assert(
			fc.property(
				packageArb(),
				fc.array(fc.double({ min: 0, max: 1.5, noNaN: true }), { minLength: 1, maxLength: 4 }),
				requestArb,
				fc.constantFrom(...CENTRES),
				fc.double({ min: 20_000, max: 30_000, noNaN: true }),
				fc.double({ min: 0, max: 360, noNaN: true }),
				fc.double({ min: 0, max: 1.5, noNaN: true }),
				(pkg, heights, req, band, distance, bearing, heightM) => {
					const receivers: Receiver[] = [
						{
							name: 'Far',
							x: distance * Math.sin((bearing * Math.PI) / 180),
							y: distance * Math.cos((bearing * Math.PI) / 180),
							heightM,
							limitDb: 40,
							weighting: 'Z'
						}
					];
					const request = {
						...req,
						air: { temperatureC: 20, humidityPct: 70 },
						programme: { bandsDb: { [band]: 0 }, crestFactorDb: 6 }
					};
					const placed = withHeights(pkg, heights);
					// The receiver's level is Q_b + contCap_b(receiver) − contCap_b(position): adding the
					// position's capability back gives the sound field at the receiver itself.
					const field = (groundFactor: number | null) => {
						const r = evaluatePackage(placed, {
							...request,
							site: { aimDeg: 0, groundFactor, receivers }
						});
						return r.receivers[0].predictedDb! + r.bands[0].capabilityDb;
					};
					fc.pre(Number.isFinite(field(null)));
					expect(field(0) - field(null)).toBeCloseTo(6, 1);
				}
			)
		);
	});

	it('a directivity table of zeros equals no directivity for subwoofers', () => {
		const subs = fc.array(groupArb(fc.constant<LoudspeakerKind>('subwoofer')), {
			minLength: 1,
			maxLength: 3
		});
		fc.assert(
			fc.property(subs, requestArb, siteArb, fc.boolean(), (groups, req, site, onGroup) => {
				const zeros = {
					anglesDeg: [0, 45, 90, 135, 180],
					bandsDb: { 31.5: [0, 0, 0, 0, 0], 125: [0, 0, 0, 0, 0] }
				};
				const withTable = groups.map((g) =>
					onGroup
						? { ...g, directivity: zeros }
						: { ...g, loudspeaker: { ...g.loudspeaker, directivity: zeros } }
				);
				const plain = evaluatePackage({ groups }, { ...req, site });
				const tabled = evaluatePackage({ groups: withTable }, { ...req, site });
				expect(tabled.receivers).toEqual(plain.receivers);
				expect(tabled.bands).toEqual(plain.bands);
			})
		);
	});

	it("levelGrid at a receiver's point equals that receiver's prediction", () => {
		fc.assert(
			fc.property(
				packageArb(),
				heightsArb,
				requestArb,
				siteArb,
				receiverArb,
				fc.double({ min: 0.5, max: 200, noNaN: true }),
				fc.integer({ min: 0, max: 4 }),
				fc.integer({ min: 0, max: 4 }),
				(pkg, heights, req, site, receiver, stepM, i, j) => {
					const grid = {
						xMinM: receiver.x - i * stepM,
						yMinM: receiver.y - j * stepM,
						xMaxM: receiver.x + 2 * stepM,
						yMaxM: receiver.y + stepM,
						stepM,
						heightM: receiver.heightM,
						weighting: receiver.weighting
					};
					const placed = withHeights(pkg, heights);
					const map = levelGrid(placed, { ...req, site }, grid);
					const x = grid.xMinM + i * stepM;
					const y = grid.yMinM + j * stepM;
					const predicted = evaluatePackage(placed, {
						...req,
						site: { ...site, receivers: [{ ...receiver, x, y }] }
					}).receivers[0].predictedDb!;
					const mapped = map.levels[j * map.nx + i];
					if (predicted === -Infinity) expect(mapped).toBeNaN();
					else expect(mapped).toBe(predicted);
				}
			)
		);
	});

	it("outcome is never 'clear' (nor 'tight') when limits.ok is false, and is 'short' exactly when the verdict is", () => {
		fc.assert(
			fc.property(packageArb(), heightsArb, requestArb, siteArb, (pkg, heights, req, site) => {
				const r = evaluatePackage(withHeights(pkg, heights), { ...req, site });
				if (!r.limits.ok) expect(['over-limit', 'short']).toContain(r.outcome);
				expect(r.outcome === 'short').toBe(r.verdict === 'short');
				if (r.outcome !== 'short' && r.outcome !== 'over-limit') expect(r.outcome).toBe(r.verdict);
			})
		);
	});
});
