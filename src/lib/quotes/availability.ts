/**
 * Stock arithmetic for a hire: units in service of each model, minus the units already reserved
 * by confirmed bookings whose dates overlap, against what a package needs.
 */
import { datesOverlap } from './hire-days';
import type { ModelType } from '../inventory/types';

export type ModelKey = `${ModelType}:${number}`;

export interface Reservation {
	startDate: string;
	endDate: string;
	quantities: Partial<Record<ModelKey, number>>;
}

export interface Shortfall {
	model: ModelKey;
	needed: number;
	available: number;
	missing: number;
}

export interface Availability {
	ok: boolean;
	shortfalls: Shortfall[];
	/** Units free on the dates, per model the package needs. */
	free: Partial<Record<ModelKey, number>>;
}

export function reservedOn(
	reservations: Reservation[],
	startDate: string,
	endDate: string
): Partial<Record<ModelKey, number>> {
	const reserved: Partial<Record<ModelKey, number>> = {};
	for (const r of reservations) {
		if (!datesOverlap(r.startDate, r.endDate, startDate, endDate)) continue;
		for (const [model, qty] of Object.entries(r.quantities) as [ModelKey, number][]) {
			reserved[model] = (reserved[model] ?? 0) + qty;
		}
	}
	return reserved;
}

/**
 * Overlapping reservations are summed as if they all fell on one day: conservative, since two
 * bookings on different days inside the range could share units, but never double-books.
 */
export function checkAvailability(
	needed: Partial<Record<ModelKey, number>>,
	inService: Partial<Record<ModelKey, number>>,
	reservations: Reservation[],
	startDate: string,
	endDate: string
): Availability {
	const reserved = reservedOn(reservations, startDate, endDate);
	const shortfalls: Shortfall[] = [];
	const free: Partial<Record<ModelKey, number>> = {};
	for (const [model, qty] of Object.entries(needed) as [ModelKey, number][]) {
		const available = Math.max(0, (inService[model] ?? 0) - (reserved[model] ?? 0));
		free[model] = available;
		if (available < qty) shortfalls.push({ model, needed: qty, available, missing: qty - available });
	}
	return { ok: shortfalls.length === 0, shortfalls, free };
}
