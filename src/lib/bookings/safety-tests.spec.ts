import { describe, expect, it } from 'vitest';
import { mondayOf } from './calendar';
import { addDays, testDueDate, testStatus } from './safety-tests';

describe('electrical safety test dates', () => {
	it('is due an interval after the last test, due soon within 14 days, overdue the day after', () => {
		expect(testDueDate('2026-01-31', 30)).toBe('2026-03-02');
		expect(testStatus('2026-01-01', 365, '2026-12-01')).toBe('in-date');
		expect(testStatus('2026-01-01', 365, '2026-12-18')).toBe('due-soon');
		expect(testStatus('2026-01-01', 365, '2027-01-01')).toBe('due-soon');
		expect(testStatus('2026-01-01', 365, '2027-01-02')).toBe('overdue');
	});

	it('a unit never tested is overdue', () => {
		expect(testStatus(null, 365, '2026-06-01')).toBe('overdue');
	});

	it('counts calendar days across leap years and finds Mondays', () => {
		expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
		expect(mondayOf('2026-12-06')).toBe('2026-11-30');
		expect(mondayOf('2026-11-30')).toBe('2026-11-30');
	});
});
