/**
 * Electrical safety tests: a unit is due again `intervalDays` after its last test. Intervals are the
 * hire company's own choice (common practice: formal tests at fixed intervals plus a visual check before
 * each hire; the interval depends on the kind of equipment and local rules, so it is a setting).
 * A unit never tested counts as overdue: it has no test to rely on.
 */
export const DUE_SOON_DAYS = 14;

export type TestStatus = 'in-date' | 'due-soon' | 'overdue';

export function addDays(isoDate: string, days: number): string {
	const d = new Date(`${isoDate}T00:00:00Z`);
	d.setUTCDate(d.getUTCDate() + days);
	return d.toISOString().slice(0, 10);
}

/** The last day the test is valid, or null when the unit has never been tested. */
export function testDueDate(lastTestedAt: string | null, intervalDays: number): string | null {
	return lastTestedAt ? addDays(lastTestedAt, intervalDays) : null;
}

export function testStatus(lastTestedAt: string | null, intervalDays: number, today: string): TestStatus {
	const due = testDueDate(lastTestedAt, intervalDays);
	if (due === null || due < today) return 'overdue';
	if (due <= addDays(today, DUE_SOON_DAYS)) return 'due-soon';
	return 'in-date';
}
