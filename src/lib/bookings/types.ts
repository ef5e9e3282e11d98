/** What the warehouse pages and the API show of a booking and its pick list. */
import type { BookingState } from './states';
import type { ModelType } from '../inventory/types';

export type UnitOnBooking = { id: number; serial: string; location: string; on: 'reserved' | 'out' | 'back' };

export interface PickLine {
	modelType: ModelType;
	modelId: number;
	name: string;
	quantity: number;
	/** Units reserved for, out on, or back from this booking. */
	units: UnitOnBooking[];
	/** Units still to scan out: the quantity less those out or back. */
	missing: number;
	/** Ready units free on the dates, for reserving ahead of loading. */
	candidates: { id: number; serial: string; location: string }[];
}

export interface BookingSummary {
	id: number;
	quoteId: number;
	reference: string;
	eventName: string;
	clientName: string;
	clientId: number;
	startDate: string;
	endDate: string;
	state: BookingState;
	stateWords: string;
	cabinets: number;
	amplifiers: number;
	needed: number;
	/** Units reserved for the booking by serial (not yet out). */
	reserved: number;
	dispatched: number;
	returned: number;
}

