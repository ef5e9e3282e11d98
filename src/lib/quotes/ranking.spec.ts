import { describe, expect, it } from 'vitest';
import { rank } from './ranking';

const item = (name: string, verdict: 'clear' | 'tight' | 'short', totalMinor: number, available = true, headroomDb = 5) => ({
	name,
	verdict,
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
