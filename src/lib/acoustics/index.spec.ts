import { describe, expect, it } from 'vitest';
import * as acoustics from './index';

describe('public surface (names other code and outside checks call)', () => {
	it('exports the contract functions and the helpers the UI needs', () => {
		for (const name of [
			'aWeighting',
			'cWeighting',
			'weighting',
			'airAbsorption',
			'sumLevels',
			'evaluatePackage',
			'levelGrid',
			'groundAttenuation',
			'directivityDb',
			'compareOutcomes',
			'levelAtDistance',
			'levelCurve',
			'feetToMetres',
			'metresToFeet',
			'speedOfSound'
		]) {
			expect(typeof (acoustics as Record<string, unknown>)[name], name).toBe('function');
		}
		expect(acoustics.NOMINAL_BAND_CENTRES_HZ).toHaveLength(9);
		expect(acoustics.EXACT_BAND_FREQUENCIES_HZ).toHaveLength(9);
		expect(acoustics.MODEL_ASSUMPTIONS.length).toBeGreaterThan(0);
		expect(acoustics.DEFAULT_MARGIN_DB).toBe(3);
		expect(acoustics.OUTCOME_ORDER).toEqual(['clear', 'tight', 'over-limit', 'short']);
	});
});
