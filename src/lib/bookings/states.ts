/**
 * A booking's life cycle: confirmed (stock reserved) → out (some or all units scanned out) → back
 * (every unit that went out has been scanned back) → closed (checked and done). Cancelled is reached
 * from confirmed only, through the quote. Pure, so pages, API and services read the same rules.
 */
export const BOOKING_STATES = ['confirmed', 'out', 'back', 'closed', 'cancelled'] as const;
export type BookingState = (typeof BOOKING_STATES)[number];

/** States that hold stock: their units count as reserved on the hire dates. */
export const HOLDING_STATES: readonly BookingState[] = ['confirmed', 'out'];

export const STATE_LABELS: Record<BookingState, string> = {
	confirmed: 'Confirmed',
	out: 'Out',
	back: 'Back',
	closed: 'Closed',
	cancelled: 'Cancelled'
};

export interface Progress {
	state: BookingState;
	/** Units the booking needs in all. */
	needed: number;
	/** Units scanned out, including those since returned. */
	dispatched: number;
	/** Units scanned back. */
	returned: number;
}

/** The state after a unit is scanned out or back; dispatching moves confirmed → out, the last return out → back. */
export function stateAfterScan(p: Progress): BookingState {
	if (p.state === 'confirmed' && p.dispatched > 0) return 'out';
	if (p.state === 'out' && p.dispatched > 0 && p.returned === p.dispatched) return 'back';
	return p.state;
}

export function canDispatch(state: BookingState): boolean {
	return state === 'confirmed' || state === 'out';
}

export function canReturn(state: BookingState): boolean {
	return state === 'out';
}

/**
 * Why the booking cannot be closed, or null. A booking is closed once everything that left is back;
 * a booking that went out only in part can be closed when its returns are complete.
 */
export function closeRefusal(p: Progress): string | null {
	if (p.state === 'closed') return 'This booking is already closed.';
	if (p.state === 'cancelled') return 'A cancelled booking cannot be closed.';
	if (p.state === 'confirmed') return 'Nothing has gone out yet: cancel the quote instead of closing.';
	const stillOut = p.dispatched - p.returned;
	if (stillOut > 0) return `${stillOut} ${stillOut === 1 ? 'unit is' : 'units are'} still out: scan ${stillOut === 1 ? 'it' : 'them'} back first.`;
	return null;
}

/** The state of a hire in plain words, for the client and the lists. */
export function progressInWords(p: Progress): string {
	const stillOut = p.dispatched - p.returned;
	switch (p.state) {
		case 'confirmed':
			return p.dispatched > 0
				? `Being loaded: ${p.dispatched} of ${p.needed} units ready to leave.`
				: 'Confirmed: the equipment is reserved for your dates and will be prepared before the hire.';
		case 'out':
			if (p.returned > 0) return `Partly back: ${p.returned} of ${p.dispatched} units returned, ${stillOut} still with you.`;
			return p.dispatched < p.needed
				? `Partly out: ${p.dispatched} of ${p.needed} units have left the warehouse.`
				: `Out: all ${p.needed} units have left the warehouse.`;
		case 'back':
			return `Back: all ${p.returned} units have been returned and are being checked.`;
		case 'closed':
			return 'Closed: the hire is complete. Thank you.';
		case 'cancelled':
			return 'Cancelled: nothing is reserved for this hire.';
	}
}
