import { describe, expect, it } from 'vitest';
import { cabinetCapability, channelPowerW, sensitivity1WDb } from './power';
import { amplifier, loudspeaker } from '../../../tests/helpers/acoustics/fixtures';

describe('sensitivity and power, worked examples', () => {
	it('Holt, "How to Calculate Maximum SPL" (Stereophile): 92 dB/1 W/1 m with 160 W → 114 dB at 1 m', () => {
		const capability = cabinetCapability(loudspeaker(), amplifier(), 1, 'test');
		expect(capability.continuousDb).toBeCloseTo(114, 0);
		expect(capability.continuousDb).toBeCloseTo(92 + 10 * Math.log10(160), 12);
	});

	it('2.83 V into 4 Ω is 2 W, so S(1 W) = S(2.83 V) − 3.01 dB; into 8 Ω the two are equal', () => {
		expect((2.83 * 2.83) / 4).toBeCloseTo(2, 2);
		expect(
			sensitivity1WDb({ sensitivityDb: 95, sensitivityRef: '2.83V', impedanceOhm: 4 })
		).toBeCloseTo(95 - 3.01, 2);
		expect(sensitivity1WDb({ sensitivityDb: 95, sensitivityRef: '2.83V', impedanceOhm: 8 })).toBe(
			95
		);
		expect(sensitivity1WDb({ sensitivityDb: 95, sensitivityRef: '1W', impedanceOhm: 4 })).toBe(95);
	});
});

describe('contract step 1: channel power into the parallel load', () => {
	const amp = amplifier({ powerW: { 8: 1000, 4: 1600, 2: 2000 }, minLoadOhm: 2 });

	it('at a rated load gives the rating (8, 4, 2 Ω; 16 Ω / 2 counts as exactly 8 Ω)', () => {
		expect(channelPowerW(amp, 8)).toBe(1000);
		expect(channelPowerW(amp, 4)).toBe(1600);
		expect(channelPowerW(amp, 2)).toBe(2000);
		expect(channelPowerW(amp, 16 / 2)).toBe(1000);
	});

	it('above 8 Ω scales from 8 Ω: P = P(8)·8/Z_L', () => {
		expect(channelPowerW(amp, 16)).toBe(500);
	});

	it('between rated loads scales from the load above, uncapped when under the rating below', () => {
		expect(channelPowerW(amp, 6)).toBeCloseTo((1000 * 8) / 6, 9);
	});

	it('between rated loads is capped at the rating of the load below', () => {
		const softAmp = amplifier({ powerW: { 8: 1000, 4: 1200 } });
		expect(channelPowerW(softAmp, 6)).toBe(1200);
		expect(channelPowerW(amp, 8 / 3)).toBe(2000); // 1600·4/(8/3) = 2400, capped at P(2) = 2000
	});

	it('below the smallest rated load (but not below the minimum) scales with no cap', () => {
		const amp84 = amplifier({ powerW: { 8: 1000, 4: 1600 }, minLoadOhm: 2 });
		expect(channelPowerW(amp84, 8 / 3)).toBeCloseTo(1600 * 1.5, 9);
	});

	it('above every rated load when 8 Ω is not rated: scales from the largest rated load', () => {
		expect(channelPowerW(amplifier({ powerW: { 4: 1600 } }), 8)).toBe(800);
	});

	it('throws "load below amplifier minimum" with the load and the fix, and accepts the minimum itself', () => {
		const amp4 = amplifier({ powerW: { 8: 1000, 4: 1600 }, minLoadOhm: 4 });
		expect(() => channelPowerW(amp4, 8 / 3)).toThrow(
			/load below amplifier minimum.*2\.67 Ω.*rated down to 4 Ω.*fewer cabinets per channel/
		);
		expect(channelPowerW(amp4, 4)).toBe(1600);
	});

	it('per cabinet, the channel power is shared: P_cab = P(Z_L)/k', () => {
		expect(cabinetCapability(loudspeaker(), amp, 2, 'test').powerPerCabinetW).toBe(800);
		expect(cabinetCapability(loudspeaker(), amp, 4, 'test').powerPerCabinetW).toBe(500);
	});
});

describe('contract step 2: capability at 1 m and what binds it', () => {
	it('amplifier binds when P_cab is below the rating (continuous) and 2·P_cab below the peak rating (peak)', () => {
		const c = cabinetCapability(loudspeaker({ powerContinuousW: 500 }), amplifier(), 1, 'test');
		expect([c.continuousLimit, c.peakLimit]).toEqual(['amplifier', 'amplifier']);
		// Peak of a sine: a sine of RMS power P peaks at 2P, +10·lg 2 = +3.01 dB (v2 step 2).
		expect(c.peakDb - c.continuousDb).toBeCloseTo(10 * Math.log10(2), 12);
		expect(c.peakDb - c.continuousDb).toBeCloseTo(3.01, 2);
	});

	it('v2: the peak side is thermal once 2·P_cab reaches the peak rating, while the continuous side is still the amplifier', () => {
		// 160 W amplifier, 200 W continuous / 320 W peak cabinet: P_cab < 200 but 2·P_cab = 320.
		const c = cabinetCapability(
			loudspeaker({ powerContinuousW: 200, powerPeakW: 320 }),
			amplifier(),
			1,
			'test'
		);
		expect([c.continuousLimit, c.peakLimit]).toEqual(['amplifier', 'thermal']);
		expect(c.peakDb).toBeCloseTo(92 + 10 * Math.log10(320), 12);
	});

	it('v2: power compression lowers the continuous side only; the max SPL cap applies after it', () => {
		const plain = cabinetCapability(loudspeaker(), amplifier(), 1, 'test');
		const compressed = cabinetCapability(
			loudspeaker({ compressionDb: 2.5 }),
			amplifier(),
			1,
			'test'
		);
		expect(plain.continuousDb - compressed.continuousDb).toBeCloseTo(2.5, 12);
		expect(compressed.peakDb).toBe(plain.peakDb);
		const capped = cabinetCapability(
			loudspeaker({ compressionDb: 2.5, maxSplContinuousDb: 110 }),
			amplifier(),
			1,
			'test'
		);
		expect([capped.continuousDb, capped.continuousLimit]).toEqual([110, 'max-spl']);
	});

	it('thermal binds when the cabinet rating is smaller; peak rating defaults to 4 × continuous (+6 dB)', () => {
		const c = cabinetCapability(
			loudspeaker({ powerContinuousW: 100 }),
			amplifier({ powerW: { 8: 10000 } }),
			1,
			'test'
		);
		expect(c.continuousLimit).toBe('thermal');
		expect(c.continuousDb).toBeCloseTo(92 + 20, 12);
		expect(c.peakLimit).toBe('thermal');
		expect(c.peakDb - c.continuousDb).toBeCloseTo(6.02, 2);
	});

	it('an explicit peak rating is used instead of the 4× default', () => {
		const c = cabinetCapability(
			loudspeaker({ powerContinuousW: 100, powerPeakW: 200 }),
			amplifier({ powerW: { 8: 10000 } }),
			1,
			'test'
		);
		expect(c.peakDb - c.continuousDb).toBeCloseTo(3.01, 2);
	});

	it('max SPL caps each side separately', () => {
		const c = cabinetCapability(
			loudspeaker({ maxSplContinuousDb: 110, maxSplPeakDb: 113 }),
			amplifier(),
			1,
			'test'
		);
		expect([c.continuousDb, c.continuousLimit, c.peakDb, c.peakLimit]).toEqual([
			110,
			'max-spl',
			113,
			'max-spl'
		]);
		const loose = cabinetCapability(
			loudspeaker({ maxSplContinuousDb: 130 }),
			amplifier(),
			1,
			'test'
		);
		expect(loose.continuousLimit).toBe('amplifier');
	});

	it('ties: P_cab equal to the rating is thermal; v2: max-spl only when the cap is strictly lower', () => {
		const atRating = cabinetCapability(
			loudspeaker({ powerContinuousW: 160 }),
			amplifier(),
			1,
			'test'
		);
		expect(atRating.continuousLimit).toBe('thermal');
		const level = 92 + 10 * Math.log10(160);
		expect(
			cabinetCapability(loudspeaker({ maxSplContinuousDb: level }), amplifier(), 1, 'test')
				.continuousLimit
		).toBe('amplifier');
		expect(
			cabinetCapability(loudspeaker({ maxSplContinuousDb: level - 1e-9 }), amplifier(), 1, 'test')
				.continuousLimit
		).toBe('max-spl');
	});
});
