import { describe, expect, it } from 'vitest';
import { AcousticsInputError } from './errors';
import { evaluatePackage } from './evaluate';
import { amplifier, group, request } from '../../../tests/helpers/acoustics/fixtures';
import type { GroupSpec, QuoteRequest, Weighting } from './types';

const evaluate =
	(g: GroupSpec = group(), r: Partial<QuoteRequest> = {}) =>
	() =>
		evaluatePackage({ groups: [g] }, request(r));

describe('evaluatePackage refuses what it cannot evaluate, with a message the user can act on', () => {
	it('load below amplifier minimum (four 8 Ω cabinets on a channel = 2 Ω, amplifier rated to 4 Ω)', () => {
		const g = group({ count: 4, cabinetsPerChannel: 4, amplifier: amplifier({ minLoadOhm: 4 }) });
		expect(evaluate(g)).toThrow(/Group 1 \(full-range\): load below amplifier minimum/);
		expect(evaluate(g)).toThrow(AcousticsInputError);
		expect(evaluate(g)).toThrow(Error);
	});

	it('line-array element without heightM', () => {
		expect(evaluate(group({}, { kind: 'line-array-element' }))).toThrow(
			/line-array element needs its height \(heightM\)/
		);
	});

	it.each([0, -10, Number.NaN, Infinity])('distance %s', (distanceM) => {
		expect(evaluate(group(), { distanceM })).toThrow(
			/Distance to the position must be a positive, finite number of metres/
		);
	});

	it('boundary distance that is not positive and finite', () => {
		expect(evaluate(group(), { boundary: { distanceM: 0, limitDb: 75, weighting: 'A' } })).toThrow(
			/Distance to the boundary must be a positive/
		);
	});

	it('unknown weighting, on the target or the boundary', () => {
		expect(evaluate(group(), { weighting: 'B' as Weighting })).toThrow(
			/Target level has unknown weighting "B"/
		);
		expect(
			evaluate(group(), { boundary: { distanceM: 100, limitDb: 75, weighting: 'dB' as Weighting } })
		).toThrow(/Boundary limit has unknown weighting "dB"/);
	});

	it('programme with no bands, or a band the model does not have', () => {
		expect(evaluate(group(), { programme: { bandsDb: {}, crestFactorDb: 12 } })).toThrow(
			/Programme has no bands/
		);
		const extra = { bandsDb: { 1000: 0, 16000: -10 } as Record<number, number>, crestFactorDb: 12 };
		expect(evaluate(group(), { programme: extra })).toThrow(
			/Programme band "16000" is not one of the model's octave bands/
		);
		expect(
			evaluate(group(), { programme: { bandsDb: { 1000: Number.NaN }, crestFactorDb: 12 } })
		).toThrow(/Programme level at 1000 Hz/);
	});

	it('negative crest factor or margin', () => {
		expect(evaluate(group(), { programme: { bandsDb: { 1000: 0 }, crestFactorDb: -1 } })).toThrow(
			/crest factor cannot be negative/
		);
		expect(evaluate(group(), { marginDb: -3 })).toThrow(/margin cannot be negative/);
	});

	it('more cabinets per channel than a stack holds', () => {
		expect(evaluate(group({ count: 1, stacks: 2, cabinetsPerChannel: 2 }))).toThrow(
			/2 cabinets per channel but only 1 in each stack/
		);
	});

	it('non-whole counts, unknown kinds, missing ratings, inverted frequency range', () => {
		expect(evaluate(group({ count: 1.5 }))).toThrow(/cabinet count must be a whole number/);
		expect(evaluate(group({}, { kind: 'horn' as never }))).toThrow(/unknown loudspeaker kind/);
		expect(evaluate(group({ amplifier: amplifier({ powerW: {} }) }))).toThrow(
			/amplifier has no power rating/
		);
		expect(evaluate(group({}, { lowHz: 500, highHz: 100 }))).toThrow(
			/low frequency limit 500 Hz is above the high limit 100 Hz/
		);
		expect(evaluate(group({}, { powerContinuousW: 0 }))).toThrow(
			/continuous power rating \(W\) must be greater than zero/
		);
	});

	it('impossible air', () => {
		expect(evaluate(group(), { air: { temperatureC: 20, humidityPct: 101 } })).toThrow(
			/humidity must be between 0 and 100/
		);
	});
});
