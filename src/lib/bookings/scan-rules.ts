/**
 * What a scanned serial must satisfy before it goes out on a booking or comes back from it. Pure:
 * the service gathers the facts under row locks, these functions give the refusal in plain words.
 */
import type { StockUnitStatus } from '$lib/schemas/inventory-units';
import { canDispatch, canReturn, type BookingState } from './states';
import type { TestStatus } from './safety-tests';

export interface DispatchFacts {
	bookingState: BookingState;
	serial: string;
	unit: { status: StockUnitStatus; modelName: string } | null;
	/** The booking's line for the unit's model, or null when the booking has no such model. */
	line: { needed: number; dispatched: number } | null;
	/** Already scanned out on this booking and not back. */
	outHere: boolean;
	/** Out on another booking and not back (its reference). */
	outOn: string | null;
	/** Reserved (assigned, not yet out) for another booking on overlapping dates (its reference). */
	reservedFor: string | null;
	test: TestStatus;
	testDue: string | null;
}

export function dispatchRefusal(f: DispatchFacts): string | null {
	if (!canDispatch(f.bookingState)) return `This booking is ${f.bookingState}: nothing more can go out on it.`;
	if (!f.unit) return `No unit has the serial ${f.serial}. Check the label, or type the serial as printed.`;
	if (f.outHere) return `${f.serial} is already scanned out on this booking.`;
	if (!f.line) return `${f.serial} is a ${f.unit.modelName}, which this booking does not need.`;
	if (f.outOn) return `${f.serial} is out on booking ${f.outOn} and has not come back.`;
	if (f.reservedFor) return `${f.serial} is reserved for booking ${f.reservedFor} on overlapping dates; scan another ${f.unit.modelName}.`;
	if (f.unit.status !== 'ready') return `${f.serial} is ${f.unit.status === 'in-repair' ? 'in repair' : 'retired'}, not ready to go out.`;
	if (f.test === 'overdue')
		return f.testDue
			? `${f.serial} is overdue for its electrical safety test (due ${f.testDue}); it stays in until tested.`
			: `${f.serial} has no electrical safety test on record; it stays in until tested.`;
	if (f.line.dispatched >= f.line.needed) return `All ${f.line.needed} ${f.unit.modelName} for this booking are already out.`;
	return null;
}

export interface ReturnFacts {
	bookingState: BookingState;
	serial: string;
	known: boolean;
	outHere: boolean;
	returnedHere: boolean;
}

export function returnRefusal(f: ReturnFacts): string | null {
	if (!canReturn(f.bookingState)) return `This booking is ${f.bookingState}: there is nothing out to scan back.`;
	if (!f.known) return `No unit has the serial ${f.serial}. Check the label, or type the serial as printed.`;
	if (f.returnedHere) return `${f.serial} is already scanned back.`;
	if (!f.outHere) return `${f.serial} did not go out on this booking.`;
	return null;
}
