import { describe, expect, it } from 'vitest';
import { coverageText } from './plain-language';

describe('coverage in words', () => {
	it('says the width in the unit of the request (1 ft = 0.3048 m exactly, by definition)', () => {
		expect(coverageText(12, 'm')).toBe('12 m wide');
		expect(coverageText(12, 'ft')).toBe('39 ft wide'); // 12 / 0.3048 = 39.37
		expect(coverageText(30.48, 'ft')).toBe('100 ft wide');
	});

	it('says "all round" when nothing narrows it', () => {
		expect(coverageText(Infinity, 'ft')).toBe('all round');
	});
});
