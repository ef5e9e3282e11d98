/**
 * Property tests (fast-check). The model is checked against a deliberately plain reference written
 * straight from the contract's steps 1–3 in decibels, and against the physical laws it must obey.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { airAbsorption } from './absorption';
import { evaluatePackage } from './evaluate';
import {
	CENTRES,
	exactHz,
	groupArb,
	packageArb,
	referenceCapabilities,
	requestArb
} from '../../../tests/helpers/acoustics/reference';
import type { LoudspeakerKind } from './types';

const close = (actual: number, expected: number, digits = 8) =>
	expected === -Infinity
		? expect(actual).toBe(-Infinity)
		: expect(actual).toBeCloseTo(expected, digits);

describe('properties of evaluatePackage', () => {
	it('capability in every programme band equals the contract steps 1–3 computed plainly in dB', () => {
		fc.assert(
			fc.property(packageArb(), requestArb, (pkg, request) => {
				const result = evaluatePackage(pkg, request);
				const reference = referenceCapabilities(pkg, request.distanceM, request.air);
				for (const band of result.bands) {
					const b = CENTRES.indexOf(band.hz);
					close(band.capabilityDb, reference.continuous[b]);
					close(band.capabilityPeakDb, reference.peak[b]);
					close(
						band.headroomDb,
						Math.min(
							band.capabilityPeakDb - band.requiredPeakDb,
							band.capabilityDb - band.requiredDb
						)
					);
				}
				const lowest = Math.min(...result.bands.map((b) => b.headroomDb));
				expect(result.headroomDb).toBe(lowest);
				expect(result.limitingBandHz).toBe(result.bands.find((b) => b.headroomDb === lowest)!.hz);
			}),
			{ numRuns: 300 }
		);
	});

	it('point sources (ISO 9613-2 eq. (7)): doubling the distance costs 20·lg 2 = 6.02 dB plus α·x of absorption, at any distance', () => {
		const pointKinds = fc.constantFrom<LoudspeakerKind>('full-range', 'subwoofer', 'monitor');
		fc.assert(
			fc.property(packageArb(pointKinds), requestArb, (pkg, request) => {
				const near = evaluatePackage(pkg, request);
				const far = evaluatePackage(pkg, { ...request, distanceM: 2 * request.distanceM });
				near.bands.forEach((band, n) => {
					if (band.capabilityDb === -Infinity) return;
					const alpha = airAbsorption(exactHz(CENTRES.indexOf(band.hz)), request.air);
					expect(band.capabilityDb - far.bands[n].capabilityDb).toBeCloseTo(
						20 * Math.log10(2) + alpha * request.distanceM,
						8
					);
				});
			})
		);
	});

	it('doubling cabinets adds 3.01 dB (full-range, incoherent) or 6.02 dB (subwoofers, coherent within a stack)', () => {
		const oneKind = (kind: LoudspeakerKind) =>
			groupArb(fc.constant(kind)).map((g) => ({
				...g,
				count: Math.min(g.count, 8),
				cabinetsPerChannel: 1
			}));
		const kindAndGroup = fc
			.constantFrom<LoudspeakerKind>('full-range', 'subwoofer')
			.chain((kind) => oneKind(kind).map((g) => [kind, g] as const));
		fc.assert(
			fc.property(kindAndGroup, requestArb, ([kind, g], request) => {
				const single = evaluatePackage({ groups: [g] }, request);
				const doubled = evaluatePackage({ groups: [{ ...g, count: 2 * g.count }] }, request);
				const gain = kind === 'subwoofer' ? 20 * Math.log10(2) : 10 * Math.log10(2);
				single.bands.forEach((band, n) => {
					if (band.capabilityDb !== -Infinity)
						expect(doubled.bands[n].capabilityDb - band.capabilityDb).toBeCloseTo(gain, 9);
				});
			})
		);
	});

	it('raising the target by x lowers every headroom and the boundary margin by x; maxTargetDb does not move', () => {
		fc.assert(
			fc.property(
				packageArb(),
				requestArb,
				fc.double({ min: -20, max: 20, noNaN: true }),
				(pkg, request, x) => {
					const before = evaluatePackage(pkg, request);
					const after = evaluatePackage(pkg, { ...request, targetDb: request.targetDb + x });
					before.bands.forEach((band, n) =>
						close(
							after.bands[n].headroomDb,
							band.headroomDb === -Infinity ? -Infinity : band.headroomDb - x
						)
					);
					if (Number.isFinite(before.boundary!.marginDb)) {
						expect(after.boundary!.marginDb).toBeCloseTo(before.boundary!.marginDb - x, 8);
						expect(after.boundary!.maxTargetDb).toBeCloseTo(before.boundary!.maxTargetDb, 8);
					}
				}
			)
		);
	});

	it('running at maxTargetDb meets the boundary limit exactly', () => {
		fc.assert(
			fc.property(packageArb(), requestArb, (pkg, request) => {
				const first = evaluatePackage(pkg, request).boundary!;
				fc.pre(Number.isFinite(first.maxTargetDb));
				const atMax = evaluatePackage(pkg, { ...request, targetDb: first.maxTargetDb }).boundary!;
				expect(atMax.predictedDb).toBeCloseTo(request.boundary!.limitDb, 8);
				expect(atMax.marginDb).toBeCloseTo(0, 8);
			})
		);
	});
});
