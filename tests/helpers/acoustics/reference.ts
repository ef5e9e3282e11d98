/**
 * Test support for src/lib/acoustics: a deliberately plain reference for contract steps 1–3 (v2,
 * without a site), written straight from the text in decibels, and fast-check generators of
 * packages and requests. The model's optimised code is checked against this in properties.spec.ts.
 */
import fc from 'fast-check';
import { airAbsorption } from '../../../src/lib/acoustics/absorption';
import { sumLevels } from '../../../src/lib/acoustics/levels';
import { speedOfSound } from '../../../src/lib/acoustics/units';
import type {
	Air,
	AmplifierSpec,
	GroupSpec,
	LoudspeakerKind,
	LoudspeakerSpec,
	PackageSpec,
	QuoteRequest,
	Receiver,
	Site,
	Weighting
} from '../../../src/lib/acoustics/types';

export const CENTRES = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;
export const exactHz = (i: number) => 1000 * 10 ** ((3 * (i - 5)) / 10);

// ---- reference, contract steps 1–3 as written ----
function referencePower(amp: AmplifierSpec, loadOhm: number): number {
	const rated = ([2, 4, 8] as const).filter((z) => amp.powerW[z] !== undefined);
	const at = (z: number) => amp.powerW[z as 2 | 4 | 8]!;
	if (rated.some((z) => z === loadOhm)) return at(loadOhm);
	const above = rated.filter((z) => z > loadOhm);
	const reference = above.length > 0 ? Math.min(...above) : Math.max(...rated);
	const below = rated.filter((z) => z < loadOhm);
	const scaled = (at(reference) * reference) / loadOhm;
	return below.length > 0 ? Math.min(scaled, at(Math.max(...below))) : scaled;
}

export function referenceCapabilities(
	pkg: PackageSpec,
	distanceM: number,
	air: Air
): { continuous: number[]; peak: number[] } {
	const x = Math.max(distanceM, 1); // any distance below 1 m is taken as 1 m
	const c = speedOfSound(air.temperatureC);
	const continuous: number[][] = CENTRES.map(() => []);
	const peak: number[][] = CENTRES.map(() => []);
	for (const g of pkg.groups) {
		const s = g.loudspeaker;
		const k = g.cabinetsPerChannel;
		const pCab = referencePower(g.amplifier, s.impedanceOhm / k) / k;
		const s1w =
			s.sensitivityRef === '2.83V'
				? s.sensitivityDb - 10 * Math.log10(8 / s.impedanceOhm)
				: s.sensitivityDb;
		// v2 step 2: compression on the continuous side, peaks of 2·P_cab, then each max SPL cap.
		const c1 = Math.min(
			s1w + 10 * Math.log10(Math.min(pCab, s.powerContinuousW)) - (s.compressionDb ?? 0),
			s.maxSplContinuousDb ?? Infinity
		);
		const p1 = Math.min(
			s1w + 10 * Math.log10(Math.min(2 * pCab, s.powerPeakW ?? 4 * s.powerContinuousW)),
			s.maxSplPeakDb ?? Infinity
		);
		const stacks = g.stacks ?? 1;
		CENTRES.forEach((centre, b) => {
			if (!(s.lowHz <= centre && centre <= s.highHz)) return;
			const response = s.bandResponseDb?.[centre] ?? 0;
			const f = exactHz(b);
			const absorption = airAbsorption(f, air) * x;
			let law: number;
			if (s.kind === 'full-range' || s.kind === 'monitor')
				law = 10 * Math.log10(g.count * stacks) - 20 * Math.log10(x);
			else if (s.kind === 'subwoofer')
				law = 20 * Math.log10(g.count) + 10 * Math.log10(stacks) - 20 * Math.log10(x);
			else {
				const h = g.count * s.heightM!;
				const dt = (h * h * f) / (2 * c);
				const gain = 20 * Math.log10(g.count) + 10 * Math.log10(stacks);
				if (dt <= 1 || x >= dt) law = gain - 20 * Math.log10(x);
				else law = gain - 20 * Math.log10(dt) - 10 * Math.log10(x / dt);
			}
			continuous[b].push(c1 + response + law - absorption);
			peak[b].push(p1 + response + law - absorption);
		});
	}
	return { continuous: continuous.map(sumLevels), peak: peak.map(sumLevels) };
}

// ---- generators ----
const kindArb = fc.constantFrom<LoudspeakerKind>(
	'full-range',
	'subwoofer',
	'line-array-element',
	'monitor'
);
const ratingsArb = fc
	.subarray([2, 4, 8] as const, { minLength: 1 })
	.chain((loads) =>
		fc.tuple(
			...loads.map((load) => fc.integer({ min: 100, max: 5000 }).map((w) => [load, w] as const))
		)
	)
	.map((pairs) => Object.fromEntries(pairs) as AmplifierSpec['powerW']);

export function groupArb(kinds = kindArb): fc.Arbitrary<GroupSpec> {
	return fc
		.record({
			kind: kinds,
			sensitivityDb: fc.double({ min: 85, max: 110, noNaN: true }),
			sensitivityRef: fc.constantFrom<'1W' | '2.83V'>('1W', '2.83V'),
			impedanceOhm: fc.constantFrom(4, 8, 16),
			powerContinuousW: fc.integer({ min: 50, max: 3000 }),
			peakFactor: fc.option(fc.double({ min: 1, max: 8, noNaN: true }), { nil: undefined }),
			maxSplContinuousDb: fc.option(fc.double({ min: 100, max: 145, noNaN: true }), {
				nil: undefined
			}),
			maxSplPeakDb: fc.option(fc.double({ min: 100, max: 150, noNaN: true }), { nil: undefined }),
			dispersionHDeg: fc.integer({ min: 10, max: 360 }),
			lowHz: fc.constantFrom(20, 30, 45, 60, 100),
			highHz: fc.constantFrom(120, 200, 8000, 18000, 20000),
			heightM: fc.double({ min: 0.1, max: 0.6, noNaN: true }),
			compressionDb: fc.option(fc.double({ min: 0, max: 4, noNaN: true }), { nil: undefined }),
			bandResponseDb: fc.option(
				fc.dictionary(
					fc.constantFrom(...CENTRES.map(String)),
					fc.double({ min: -12, max: 3, noNaN: true })
				),
				{ nil: undefined }
			),
			count: fc.integer({ min: 1, max: 16 }),
			stacks: fc.integer({ min: 1, max: 4 }),
			perChannel: fc.integer({ min: 1, max: 4 }),
			powerW: ratingsArb,
			channels: fc.constantFrom(1, 2, 4, 8)
		})
		.map((r) => ({
			loudspeaker: {
				kind: r.kind,
				sensitivityDb: r.sensitivityDb,
				sensitivityRef: r.sensitivityRef,
				impedanceOhm: r.impedanceOhm,
				powerContinuousW: r.powerContinuousW,
				powerPeakW: r.peakFactor === undefined ? undefined : r.peakFactor * r.powerContinuousW,
				maxSplContinuousDb: r.maxSplContinuousDb,
				maxSplPeakDb: r.maxSplPeakDb,
				dispersionHDeg: r.dispersionHDeg,
				dispersionVDeg: 40,
				lowHz: r.lowHz,
				highHz: r.highHz,
				heightM: r.heightM,
				compressionDb: r.compressionDb,
				bandResponseDb: r.bandResponseDb as LoudspeakerSpec['bandResponseDb']
			},
			count: r.count,
			stacks: r.stacks,
			// Keep the load at or above the 2 Ω minimum and within one stack.
			cabinetsPerChannel: Math.min(r.perChannel, r.count, r.impedanceOhm / 2),
			amplifier: { channels: r.channels, powerW: r.powerW, minLoadOhm: 2 }
		}));
}

export const packageArb = (kinds = kindArb) =>
	fc.array(groupArb(kinds), { minLength: 1, maxLength: 4 }).map((groups) => ({ groups }));
const airArb = fc.record({
	temperatureC: fc.double({ min: -10, max: 40, noNaN: true }),
	humidityPct: fc.double({ min: 10, max: 100, noNaN: true })
});
const weightingArb = fc.constantFrom<Weighting>('A', 'C', 'Z');
export const requestArb: fc.Arbitrary<QuoteRequest> = fc.record({
	targetDb: fc.double({ min: 60, max: 130, noNaN: true }),
	weighting: weightingArb,
	distanceM: fc.double({ min: 1, max: 200, noNaN: true }),
	programme: fc.record({
		bandsDb: fc
			.subarray([...CENTRES], { minLength: 1 })
			.chain((bands) =>
				fc.tuple(
					...bands.map((b) =>
						fc.double({ min: -20, max: 10, noNaN: true }).map((v) => [b, v] as const)
					)
				)
			)
			.map((pairs) => Object.fromEntries(pairs)),
		crestFactorDb: fc.double({ min: 0, max: 20, noNaN: true })
	}),
	air: airArb,
	boundary: fc.record({
		distanceM: fc.double({ min: 1, max: 2000, noNaN: true }),
		limitDb: fc.double({ min: 40, max: 100, noNaN: true }),
		weighting: weightingArb
	})
});

// ---- v2: sites and receivers ----
export const receiverArb: fc.Arbitrary<Receiver> = fc.record({
	name: fc.constantFrom('Fence', 'School', 'Houses', 'Quay'),
	x: fc.double({ min: -2000, max: 2000, noNaN: true }),
	y: fc.double({ min: -2000, max: 2000, noNaN: true }),
	heightM: fc.double({ min: 0, max: 20, noNaN: true }),
	limitDb: fc.double({ min: 30, max: 100, noNaN: true }),
	weighting: weightingArb
});

export const siteArb: fc.Arbitrary<Site> = fc.record({
	aimDeg: fc.double({ min: -360, max: 720, noNaN: true }),
	groundFactor: fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: null }),
	positionHeightM: fc.double({ min: 0, max: 10, noNaN: true }),
	allowanceDb: fc.double({ min: 0, max: 10, noNaN: true }),
	receivers: fc.array(receiverArb, { maxLength: 4 })
});

/** Group heights for packages on a site (0 m ground-stacked … 15 m flown). */
export const withHeights = (pkg: PackageSpec, heights: number[]): PackageSpec => ({
	groups: pkg.groups.map((g, i) => ({ ...g, heightM: heights[i % heights.length] }))
});
export const heightsArb = fc.array(fc.double({ min: 0, max: 15, noNaN: true }), {
	minLength: 1,
	maxLength: 4
});
