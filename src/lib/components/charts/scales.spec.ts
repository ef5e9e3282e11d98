import { describe, expect, it } from 'vitest';
import {
	clamp,
	dbDomain,
	dbStep,
	formatBandHz,
	formatDb,
	formatDistance,
	formatDistanceNumber,
	formatDistanceTick,
	formatLevel,
	formatSigned,
	fromDisplayDistance,
	headroomVerdict,
	isDrawable,
	linearScale,
	linearTicks,
	linePath,
	logScale,
	logTicks,
	thinRows,
	toDisplayDistance
} from './scales';

describe('isDrawable', () => {
	it('accepts finite numbers only', () => {
		expect(isDrawable(0)).toBe(true);
		expect(isDrawable(-12.5)).toBe(true);
		expect(isDrawable(-Infinity)).toBe(false);
		expect(isDrawable(NaN)).toBe(false);
		expect(isDrawable(null)).toBe(false);
		expect(isDrawable(undefined)).toBe(false);
	});
});

describe('scales', () => {
	it('maps linearly, including a reversed range', () => {
		const y = linearScale([0, 100], [200, 0]);
		expect(y(0)).toBe(200);
		expect(y(100)).toBe(0);
		expect(y(25)).toBe(150);
	});

	it('does not divide by zero on a flat domain', () => {
		expect(linearScale([5, 5], [0, 10])(5)).toBe(0);
	});

	it('maps each decade to an equal length on a log scale', () => {
		const x = logScale([1, 1000], [0, 300]);
		expect(x(1)).toBeCloseTo(0);
		expect(x(10)).toBeCloseTo(100);
		expect(x(100)).toBeCloseTo(200);
		expect(x(1000)).toBeCloseTo(300);
	});

	it('refuses a log domain that is not positive', () => {
		expect(() => logScale([0, 10], [0, 1])).toThrow(RangeError);
	});

	it('clamps', () => {
		expect(clamp(25, -20, 20)).toBe(20);
		expect(clamp(-25, -20, 20)).toBe(-20);
		expect(clamp(3, -20, 20)).toBe(3);
	});
});

describe('logTicks', () => {
	it('gives 1-2-5 ticks when there is room', () => {
		expect(logTicks(1, 200, 10)).toEqual([1, 2, 5, 10, 20, 50, 100, 200]);
	});

	it('keeps only ticks inside the range', () => {
		expect(logTicks(3.28, 100, 10)).toEqual([5, 10, 20, 50, 100]);
	});

	it('thins to 1-5 and then to decades when told to fit fewer', () => {
		expect(logTicks(1, 1000, 7)).toEqual([1, 5, 10, 50, 100, 500, 1000]);
		expect(logTicks(1, 1000, 4)).toEqual([1, 10, 100, 1000]);
	});

	it('skips decades when even whole decades are too many', () => {
		expect(logTicks(1, 100_000, 3)).toEqual([1, 100, 10_000]);
	});

	it('gives clean decimals below 1', () => {
		expect(logTicks(0.1, 1, 10)).toEqual([0.1, 0.2, 0.5, 1]);
	});

	it('returns nothing for an impossible range', () => {
		expect(logTicks(0, 10)).toEqual([]);
		expect(logTicks(10, 1)).toEqual([]);
	});
});

describe('dB ticks and domain', () => {
	it('chooses 5, 10 or 20 dB steps by span', () => {
		expect(dbStep(20, 6)).toBe(5);
		expect(dbStep(50, 6)).toBe(10);
		expect(dbStep(50, 3)).toBe(20);
	});

	it('lists multiples of the step', () => {
		expect(linearTicks(60, 100, 10)).toEqual([60, 70, 80, 90, 100]);
		expect(linearTicks(-20, 20, 5)).toHaveLength(9);
		expect(linearTicks(0, 10, 0)).toEqual([]);
	});

	it('rounds the domain outward to whole steps and ignores undrawable values', () => {
		expect(dbDomain([72.4, 101.3, -Infinity, null], 10)).toEqual([70, 110]);
	});

	it('widens a nearly flat domain to the minimum span', () => {
		const [lo, hi] = dbDomain([95, 96], 5, 20);
		expect(hi - lo).toBeGreaterThanOrEqual(20);
		expect(lo).toBeLessThanOrEqual(95);
		expect(hi).toBeGreaterThanOrEqual(96);
	});

	it('falls back to a default span when nothing is drawable', () => {
		expect(dbDomain([null, -Infinity], 10)).toEqual([0, 20]);
	});
});

describe('linePath', () => {
	it('draws through drawable points', () => {
		expect(
			linePath([
				{ x: 0, y: 10 },
				{ x: 5, y: 20 },
				{ x: 10, y: 15.555 }
			])
		).toBe('M0,10L5,20L10,15.56');
	});

	it('lifts the pen over −Infinity and null', () => {
		expect(
			linePath([
				{ x: 0, y: 10 },
				{ x: 1, y: -Infinity },
				{ x: 2, y: 12 },
				{ x: 3, y: 13 },
				{ x: 4, y: null }
			])
		).toBe('M0,10ZM2,12L3,13'); // d3-shape closes a lone point; nothing is drawn for it
	});

	it('is empty when nothing is drawable', () => {
		expect(linePath([{ x: 0, y: -Infinity }])).toBe('');
	});
});

describe('formatting', () => {
	it('signs values and drops the sign on zero', () => {
		expect(formatSigned(4.21)).toBe('+4.2');
		expect(formatSigned(-3)).toBe('\u22123.0');
		expect(formatSigned(-0.04)).toBe('0.0');
		expect(formatSigned(0)).toBe('0.0');
	});

	it('formats headroom with its unit, or says it is not covered', () => {
		expect(formatDb(4.2)).toBe('+4.2 dB');
		expect(formatDb(-12.345)).toBe('\u221212.3 dB');
		expect(formatDb(null)).toBe('not covered');
		expect(formatDb(-Infinity)).toBe('not covered');
	});

	it('formats absolute levels with the weighting', () => {
		expect(formatLevel(98.25, 'A')).toBe('98.3 dB(A)');
		expect(formatLevel(75, 'C')).toBe('75.0 dB(C)');
		expect(formatLevel(88)).toBe('88.0 dB');
		expect(formatLevel(-Infinity, 'Z')).toBe('—');
		expect(formatLevel(null)).toBe('—');
	});

	it('labels octave bands the way they are printed', () => {
		expect([31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000].map(formatBandHz)).toEqual([
			'31.5',
			'63',
			'125',
			'250',
			'500',
			'1k',
			'2k',
			'4k',
			'8k'
		]);
	});

	it('converts and formats distances in metres or feet (1 ft = 0.3048 m)', () => {
		expect(toDisplayDistance(30.48, 'ft')).toBeCloseTo(100);
		expect(toDisplayDistance(30, 'm')).toBe(30);
		expect(fromDisplayDistance(100, 'ft')).toBeCloseTo(30.48);
		expect(formatDistance(30, 'm')).toBe('30 m');
		expect(formatDistance(30, 'ft')).toBe('98 ft');
		expect(formatDistance(2.54, 'm')).toBe('2.5 m');
		expect(formatDistance(1, 'ft')).toBe('3.3 ft');
		expect(formatDistanceNumber(120, 'm')).toBe('120');
	});

	it('shortens large distance ticks', () => {
		expect(formatDistanceTick(50)).toBe('50');
		expect(formatDistanceTick(1000)).toBe('1k');
		expect(formatDistanceTick(2000)).toBe('2k');
		expect(formatDistanceTick(0.5)).toBe('0.5');
	});
});

describe('headroomVerdict', () => {
	it('is short below zero, tight from zero up to the margin, clear at or above it', () => {
		expect(headroomVerdict(-0.1, 3)).toBe('short');
		expect(headroomVerdict(0, 3)).toBe('tight');
		expect(headroomVerdict(2.9, 3)).toBe('tight');
		expect(headroomVerdict(3, 3)).toBe('clear');
		expect(headroomVerdict(0, 0)).toBe('clear');
	});

	it('marks a band with no number as not covered', () => {
		expect(headroomVerdict(null, 3)).toBe('not-covered');
		expect(headroomVerdict(-Infinity, 3)).toBe('not-covered');
	});
});

describe('thinRows', () => {
	it('keeps short lists whole', () => {
		expect(thinRows([1, 2, 3], 5)).toEqual([1, 2, 3]);
	});

	it('thins long lists evenly and always keeps the last item', () => {
		const items = Array.from({ length: 20 }, (_, i) => i);
		const rows = thinRows(items, 12);
		expect(rows.length).toBeLessThanOrEqual(12);
		expect(rows[0]).toBe(0);
		expect(rows[1]).toBe(2);
		expect(rows[rows.length - 1]).toBe(19);
	});
});
