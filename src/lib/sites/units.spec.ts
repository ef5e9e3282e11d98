import { describe, expect, it } from 'vitest';
import { formatBearing, formatLength, fromDisplayLength, lengthInputValue, toDisplayLength } from './units';

// 1 ft = 0.3048 m exactly (international foot, 1959 agreement).
describe("metres and feet at the plan's edge", () => {
	it('converts both ways with the international foot', () => {
		expect(toDisplayLength(0.3048, 'ft')).toBeCloseTo(1, 12);
		expect(fromDisplayLength(100, 'ft')).toBeCloseTo(30.48, 12);
		expect(toDisplayLength(42, 'm')).toBe(42);
		expect(fromDisplayLength(toDisplayLength(123.4, 'ft'), 'ft')).toBeCloseTo(123.4, 12);
	});

	it('formats lengths and bearings for the table', () => {
		expect(formatLength(12.34, 'm')).toBe('12.3 m');
		expect(formatLength(152.4, 'ft')).toBe('500 ft');
		expect(formatLength(-0.01, 'm')).toBe('0.0 m');
		expect(lengthInputValue(30.48, 'ft')).toBe('100');
		expect(formatBearing(359.7)).toBe('0°');
		expect(formatBearing(44.6)).toBe('45°');
	});
});
