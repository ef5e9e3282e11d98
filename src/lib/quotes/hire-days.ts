/** Hire dates are calendar days (YYYY-MM-DD), inclusive at both ends: collect on the first, return on the last. */
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const DAY_MS = 86_400_000;

export function parseIsoDate(value: string): number | null {
	if (!ISO_DATE.test(value)) return null;
	const ms = Date.parse(`${value}T00:00:00Z`);
	if (Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== value) return null;
	return ms;
}

export function hireDays(startDate: string, endDate: string): number {
	const start = parseIsoDate(startDate);
	const end = parseIsoDate(endDate);
	if (start === null || end === null) throw new Error('Hire dates must be real dates as YYYY-MM-DD');
	if (end < start) throw new Error('The hire cannot end before it starts');
	return Math.round((end - start) / DAY_MS) + 1;
}

/** Two inclusive date ranges share at least one day. ISO dates compare correctly as strings. */
export function datesOverlap(aStart: string, aEnd: string, bStart: string, bEnd: string): boolean {
	return aStart <= bEnd && bStart <= aEnd;
}
