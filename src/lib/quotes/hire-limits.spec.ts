import { describe, expect, it } from 'vitest';
import { quoteRequestSchema } from '../schemas/evaluation';
import { MAX_CHARGE_MINOR, MAX_HIRE_DAYS, chargeTooLarge, localIsoDate } from './hire-limits';

const request = (startDate: string, endDate: string) => ({
	targetDb: 90, weighting: 'A', distance: 20, distanceUnit: 'm', programme: 'speech', startDate, endDate
});
const issuesOf = (startDate: string, endDate: string) => {
	const parsed = quoteRequestSchema.safeParse(request(startDate, endDate));
	return parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message]));
};

describe('hire limits', () => {
	it('reads today in the server’s own time zone', () => {
		expect(localIsoDate(new Date(2031, 0, 9, 23, 30))).toBe('2031-01-09');
		expect(localIsoDate(new Date(2031, 11, 31, 0, 5))).toBe('2031-12-31');
	});

	it('refuses a start before today; today itself is fine', () => {
		const today = localIsoDate(new Date());
		expect(issuesOf('2020-01-01', '2020-01-02').startDate).toMatch(/past/);
		expect(issuesOf(today, today)).toEqual({});
	});

	it(`caps a hire at ${MAX_HIRE_DAYS} days, on the end date`, () => {
		expect(MAX_HIRE_DAYS).toBe(365);
		expect(issuesOf('2040-01-01', '2040-12-30')).toEqual({}); // 365 days (leap year)
		expect(issuesOf('2040-01-01', '2040-12-31').endDate).toMatch(/365 days/);
		expect(issuesOf('2040-01-01', '9999-12-31').endDate).toMatch(/365 days/);
	});

	it('knows the payment service’s largest single charge (99,999,999 minor units)', () => {
		expect(MAX_CHARGE_MINOR).toBe(99_999_999);
		expect(chargeTooLarge(99_999_999)).toBe(false);
		expect(chargeTooLarge(100_000_000)).toBe(true);
		expect(chargeTooLarge(Number.NaN)).toBe(true);
	});
});
