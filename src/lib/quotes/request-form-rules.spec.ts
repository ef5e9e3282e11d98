import { describe, expect, it } from 'vitest';
import { convertDistances, endAfterStart, heldPackage } from './request-form-rules';

describe('request form rules', () => {
	// 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959).
	it('converts every distance when the unit changes, and back again', () => {
		const inFeet = convertDistances({ distance: 30, audienceWidth: 20, boundaryDistance: 250 }, 'm', 'ft');
		expect(inFeet).toEqual({ distance: 98.4, audienceWidth: 65.6, boundaryDistance: 820.2 });
		expect(convertDistances({ distance: 100, audienceWidth: null, boundaryDistance: null }, 'ft', 'm')).toEqual({
			distance: 30.5,
			audienceWidth: null,
			boundaryDistance: null
		});
	});

	it('moves the end date with the start date only when it would fall before it', () => {
		expect(endAfterStart('2031-06-14', '2031-06-12')).toBe('2031-06-14');
		expect(endAfterStart('2031-06-14', '')).toBe('2031-06-14');
		expect(endAfterStart('2031-06-14', '2031-06-16')).toBe('2031-06-16');
	});

	it('follows the best-ranked package until the desk picks one, then keeps the pick', () => {
		const ranked = [{ packageId: 7 }, { packageId: 3 }];
		expect(heldPackage(ranked, 3, false)).toBe(7);
		expect(heldPackage(ranked, 3, true)).toBe(3);
		expect(heldPackage([{ packageId: 7 }], 3, true)).toBe(7); // the pick is no longer offered
		expect(heldPackage([], 3, true)).toBe(3);
	});
});
