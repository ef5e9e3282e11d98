import { describe, expect, it } from 'vitest';
import { formatDate, formatDateRange, formatDateTime } from './dates';

describe('one date format', () => {
	it('writes a calendar day as "12 Jun 2027", whatever the time zone of the machine', () => {
		expect(formatDate('2027-06-12')).toBe('12 Jun 2027');
		expect(formatDate('2027-09-01')).toBe('1 Sep 2027');
		expect(formatDate(new Date('2027-12-31T23:30:00Z'))).toBe('31 Dec 2027');
	});

	it('writes a moment with its time in UTC', () => {
		expect(formatDateTime('2027-06-12T14:05:09.000Z')).toBe('12 Jun 2027, 14:05 UTC');
	});

	it('writes a hire as a range, or one day', () => {
		expect(formatDateRange('2027-06-12', '2027-06-14')).toBe('12 Jun 2027 to 14 Jun 2027');
		expect(formatDateRange('2027-06-12', '2027-06-12')).toBe('12 Jun 2027');
	});

	it('leaves something that is not a date as it was', () => {
		expect(formatDate('soon')).toBe('soon');
		expect(formatDate(null)).toBe('—');
	});
});
