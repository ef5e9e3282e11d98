/**
 * Builders for the acoustic model's unit tests (src/lib/acoustics/*.spec.ts). The default cabinet is
 * the worked example in J. G. Holt, "How to Calculate Maximum SPL" (Stereophile): 92 dB/1 W/1 m
 * driven with 160 W. Everything else is a round number chosen to make hand arithmetic easy.
 */
import type {
	AmplifierSpec,
	GroupSpec,
	LoudspeakerSpec,
	Programme,
	QuoteRequest
} from '../../../src/lib/acoustics/types';

export function loudspeaker(overrides: Partial<LoudspeakerSpec> = {}): LoudspeakerSpec {
	return {
		kind: 'full-range',
		sensitivityDb: 92,
		sensitivityRef: '1W',
		impedanceOhm: 8,
		powerContinuousW: 1000,
		dispersionHDeg: 90,
		dispersionVDeg: 60,
		lowHz: 50,
		highHz: 20000,
		...overrides
	};
}

/** 160 W into 8 Ω, as in the Holt example; 2 Ω minimum. */
export function amplifier(overrides: Partial<AmplifierSpec> = {}): AmplifierSpec {
	return { channels: 2, powerW: { 8: 160 }, minLoadOhm: 2, ...overrides };
}

export function group(
	overrides: Partial<GroupSpec> = {},
	speaker: Partial<LoudspeakerSpec> = {}
): GroupSpec {
	return {
		loudspeaker: loudspeaker(speaker),
		count: 1,
		stacks: 1,
		amplifier: amplifier(),
		cabinetsPerChannel: 1,
		...overrides
	};
}

export const ONE_KHZ_ONLY: Programme = { bandsDb: { 1000: 0 }, crestFactorDb: 0 };

/** Pink-like (equal energy per octave) over all nine bands, 12 dB crest factor (typical speech). */
export const FLAT_OCTAVES: Programme = {
	bandsDb: { 31.5: 0, 63: 0, 125: 0, 250: 0, 500: 0, 1000: 0, 2000: 0, 4000: 0, 8000: 0 },
	crestFactorDb: 12
};

export function request(overrides: Partial<QuoteRequest> = {}): QuoteRequest {
	return {
		targetDb: 90,
		weighting: 'Z',
		distanceM: 10,
		programme: ONE_KHZ_ONLY,
		air: { temperatureC: 20, humidityPct: 70 },
		...overrides
	};
}
