import { describe, expect, it } from 'vitest';
import { AcousticsInputError } from './errors';
import { groundAttenuation } from './ground';

const BANDS = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

describe('groundAttenuation: ISO 9613-2:1996 §7.3.1, Table 3 and eq. (9)', () => {
	it('PyWake ground_eff (py_wake/noise_models/iso.py): source 8 m, receiver 1.5 m, 110 m, G = 1', () => {
		const at = (band: (typeof BANDS)[number]) => groundAttenuation(band, 8, 1.5, 110, 1);
		expect(at(63)).toBeCloseTo(-3.0, 2);
		expect(at(125)).toBeCloseTo(1.67, 2);
		expect(at(250)).toBeCloseTo(6.27, 2);
		expect(at(500)).toBeCloseTo(4.42, 2);
		expect(at(1000)).toBeCloseTo(0.59, 2);
		for (const band of [2000, 4000, 8000] as const) expect(at(band)).toBeCloseTo(0, 12);
	});

	it('PyWake ground_eff: source 1 m, receiver 1.5 m, 110 m, G = 1 (ground-stacked source)', () => {
		expect(groundAttenuation(63, 1, 1.5, 110, 1)).toBeCloseTo(-3.95, 2);
		expect(groundAttenuation(250, 1, 1.5, 110, 1)).toBeCloseTo(13.23, 2);
		expect(groundAttenuation(500, 1, 1.5, 110, 1)).toBeCloseTo(12.28, 2);
	});

	it('PyWake ground_eff / ISO 9613-2 Table 3: hard ground (G = 0) far away gives −6 dB in every band', () => {
		for (const band of BANDS) expect(groundAttenuation(band, 2, 1.5, 1e7, 0)).toBeCloseTo(-6, 4);
	});

	it('ISO 9613-2 Table 3, written out: 250 Hz, h_s = 8 m, h_r = 1.5 m, d_p = 110 m, G = 1 (b′(h) both ends, q = 0)', () => {
		const near = 1 - Math.exp(-110 / 50);
		const bPrime = (h: number) => 1.5 + 8.6 * Math.exp(-0.09 * h * h) * near;
		// 30·(8 + 1.5) = 285 m ≥ 110 m, so the middle region has q = 0.
		expect(groundAttenuation(250, 8, 1.5, 110, 1)).toBeCloseTo(-3 + bPrime(8) + bPrime(1.5), 12);
	});

	it('ISO 9613-2 Table 3 with mixed ground G = 0.5, 125 Hz a′(h) and the middle term −3q(1 − G)', () => {
		const dp = 400;
		const G = 0.5;
		const near = 1 - Math.exp(-dp / 50);
		const far = 1 - Math.exp(-2.8e-6 * dp * dp);
		const aPrime = (h: number) =>
			1.5 + 3.0 * Math.exp(-0.12 * (h - 5) ** 2) * near + 5.7 * Math.exp(-0.09 * h * h) * far;
		const q = 1 - (30 * (3 + 2)) / dp;
		const expected = -1.5 + G * aPrime(3) + (-1.5 + G * aPrime(2)) - 3 * q * (1 - G);
		expect(groundAttenuation(125, 3, 2, dp, G)).toBeCloseTo(expected, 12);
		// 63 Hz: −1.5 per region and −3q in the middle, whatever G.
		expect(groundAttenuation(63, 3, 2, dp, G)).toBeCloseTo(-3 - 3 * q, 12);
		// 2–8 kHz: −1.5(1 − G) per region.
		expect(groundAttenuation(4000, 3, 2, dp, G)).toBeCloseTo(-3 * (1 - G) - 3 * q * (1 - G), 12);
	});

	it('contract step 3b: the 31.5 Hz band uses the 63 Hz row', () => {
		for (const [hs, hr, dp, G] of [
			[8, 1.5, 110, 1],
			[0.5, 4, 900, 0.3],
			[1, 1, 10, 0]
		])
			expect(groundAttenuation(31.5, hs, hr, dp, G)).toBe(groundAttenuation(63, hs, hr, dp, G));
	});

	it('ISO 9613-2 eq. (9) region rule: q = 0 up to d_p = 30(h_s + h_r), then 1 − 30(h_s + h_r)/d_p', () => {
		expect(groundAttenuation(63, 1, 1, 60, 1)).toBeCloseTo(-3, 12);
		expect(groundAttenuation(63, 1, 1, 120, 1)).toBeCloseTo(-3 - 3 * 0.5, 12);
	});

	it('refuses G outside 0 … 1, negative heights or distance, and bands the model lacks', () => {
		expect(() => groundAttenuation(500, 1, 1.5, 100, 1.2)).toThrow(AcousticsInputError);
		expect(() => groundAttenuation(500, 1, 1.5, 100, -0.1)).toThrow(
			/Ground factor G must be between 0 \(hard\) and 1 \(porous\)/
		);
		expect(() => groundAttenuation(500, -1, 1.5, 100, 1)).toThrow(/cannot be negative/);
		expect(() => groundAttenuation(500, 1, 1.5, -5, 1)).toThrow(
			/Ground distance cannot be negative/
		);
		expect(() => groundAttenuation(16000, 1, 1.5, 100, 1)).toThrow(
			/not one of the model's octave bands/
		);
	});
});
