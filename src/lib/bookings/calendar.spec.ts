import { describe, expect, it } from 'vitest';
import { calendarWeeks, weekStartsBetween } from './calendar';

describe('availability calendar', () => {
	const base = { today: '2026-12-02', inService: 6, inRepair: 1, late: [], openQuotes: [] };

	it('splits a range into Monday weeks', () => {
		expect(weekStartsBetween('2026-12-02', '2026-12-20')).toEqual(['2026-11-30', '2026-12-07', '2026-12-14']);
	});

	it('counts reserved, out and in repair per week and marks a conflict', () => {
		const weeks = calendarWeeks({
			...base,
			weekStarts: ['2026-11-30', '2026-12-07'],
			bookings: [
				{ reference: 'Q-1', startDate: '2026-12-01', endDate: '2026-12-03', needed: 4, out: 3 },
				{ reference: 'Q-2', startDate: '2026-12-08', endDate: '2026-12-09', needed: 6, out: 0 }
			]
		});
		expect(weeks[0]).toMatchObject({ reserved: 1, out: 3, inRepair: 1, free: 1, conflict: false, bookings: ['Q-1'] });
		expect(weeks[1]).toMatchObject({ reserved: 6, out: 0, free: -1, conflict: true });
	});

	it('a unit out late stays out in the weeks after its booking; open quotes that would be short are marked', () => {
		const weeks = calendarWeeks({
			...base,
			weekStarts: ['2026-11-23', '2026-12-07'],
			bookings: [],
			late: [{ endDate: '2026-11-28' }],
			openQuotes: [{ reference: 'Q-9', startDate: '2026-12-10', endDate: '2026-12-11', needed: 5 }]
		});
		expect(weeks[0]).toMatchObject({ out: 0, inRepair: 0, free: 6 });
		expect(weeks[1]).toMatchObject({ out: 1, inRepair: 1, free: 4, shortQuotes: [{ reference: 'Q-9', needed: 5 }] });
	});
});
