/**
 * The availability calendar: one model's stock week by week (Monday to Sunday). Pure arithmetic on
 * what the service gathered. Reservations overlapping a week are summed as if on one day, like the
 * quoting availability (conservative, never double-books). Units in repair and units out late are
 * known only as of today, so they count from the current week on.
 */
import { addDays } from './safety-tests';

export interface CalendarBooking {
	reference: string;
	startDate: string;
	endDate: string;
	/** Units of this model the booking needs. */
	needed: number;
	/** Of those, scanned out and not back. */
	out: number;
}

export interface CalendarInput {
	weekStarts: string[];
	today: string;
	/** Units of the model not retired. */
	inService: number;
	inRepair: number;
	/** Holding bookings (confirmed or out) that need the model. */
	bookings: CalendarBooking[];
	/** Units out on bookings that ended before today, with that end date. */
	late: { endDate: string }[];
	/** Open quotes (not yet booked) that need the model. */
	openQuotes: { reference: string; startDate: string; endDate: string; needed: number }[];
}

export interface CalendarWeek {
	weekStart: string;
	weekEnd: string;
	inService: number;
	reserved: number;
	out: number;
	inRepair: number;
	free: number;
	/** More units promised than there are: a conflict to resolve. */
	conflict: boolean;
	bookings: string[];
	shortQuotes: { reference: string; needed: number }[];
}

/** The Monday on or before a date. */
export function mondayOf(isoDate: string): string {
	const d = new Date(`${isoDate}T00:00:00Z`);
	return addDays(isoDate, -((d.getUTCDay() + 6) % 7));
}

export function weekStartsBetween(from: string, to: string, max = 53): string[] {
	const weeks: string[] = [];
	for (let w = mondayOf(from); w <= to && weeks.length < max; w = addDays(w, 7)) weeks.push(w);
	return weeks;
}

const overlaps = (a: { startDate: string; endDate: string }, start: string, end: string) => a.startDate <= end && a.endDate >= start;

export function calendarWeeks(input: CalendarInput): CalendarWeek[] {
	return input.weekStarts.map((weekStart) => {
		const weekEnd = addDays(weekStart, 6);
		const current = weekEnd >= input.today;
		const these = input.bookings.filter((b) => overlaps(b, weekStart, weekEnd));
		// A late unit's own booking covers the weeks up to its end date; after that it is still out.
		const lateOut = current ? input.late.filter((l) => l.endDate < weekStart).length : 0;
		const out = these.reduce((s, b) => s + b.out, 0) + lateOut;
		const reserved = these.reduce((s, b) => s + Math.max(0, b.needed - b.out), 0);
		const inRepair = current ? input.inRepair : 0;
		const free = input.inService - inRepair - out - reserved;
		return {
			weekStart,
			weekEnd,
			inService: input.inService,
			reserved,
			out,
			inRepair,
			free,
			conflict: free < 0,
			bookings: these.map((b) => b.reference),
			shortQuotes: input.openQuotes
				.filter((q) => overlaps(q, weekStart, weekEnd) && q.needed > Math.max(0, free))
				.map((q) => ({ reference: q.reference, needed: q.needed }))
		};
	});
}
