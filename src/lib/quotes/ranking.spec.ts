import { describe, expect, it } from 'vitest';
import type { Outcome } from '../acoustics';
import { rank } from './ranking';

const item = (name: string, outcome: Outcome, totalMinor: number, available = true, headroomDb = 5) => ({
	name,
	outcome,
	totalMinor,
	available,
	headroomDb
});

describe('ranking', () => {
	it('orders clear → tight → short, then by price', () => {
		const ranked = rank([
			item('A', 'short', 100),
			item('B', 'tight', 50),
			item('C', 'clear', 900),
			item('D', 'clear', 300),
			item('E', 'tight', 20)
		]);
		expect(ranked.map((r) => r.name)).toEqual(['D', 'C', 'E', 'B', 'A']);
	});
	it('puts over the limit after tight and before short, whatever the price (acoustics.md step 9)', () => {
		const ranked = rank([item('Short', 'short', 10), item('Over', 'over-limit', 20), item('Tight', 'tight', 900), item('Clear', 'clear', 950)]);
		expect(ranked.map((r) => r.name)).toEqual(['Clear', 'Tight', 'Over', 'Short']);
	});
	it('puts a package that is not available on the dates with the short ones', () => {
		const ranked = rank([item('Cheap but booked', 'clear', 10, false), item('Tight', 'tight', 500)]);
		expect(ranked.map((r) => r.name)).toEqual(['Tight', 'Cheap but booked']);
	});
	it('breaks price ties by headroom, and copes with no-coverage (−∞) headroom', () => {
		const ranked = rank([
			item('Less', 'short', 100, true, -Infinity),
			item('More', 'short', 100, true, -2)
		]);
		expect(ranked.map((r) => r.name)).toEqual(['More', 'Less']);
	});
});
