import { describe, expect, it } from 'vitest';
import { shownLength, typedLength } from './display-units';

describe('display units', () => {
	// 1 ft = 0.3048 m exactly (international yard and pound, 1959).
	it('shows metres as feet to 0.1 ft and takes feet back to metres', () => {
		expect(shownLength(30.48, 'ft')).toBe(100);
		expect(shownLength(12.345, 'm')).toBe(12.3);
		expect(typedLength(100, 'ft')).toBeCloseTo(30.48, 10);
		expect(typedLength(7, 'm')).toBe(7);
		expect(shownLength(NaN, 'm')).toBeNull();
	});
});
