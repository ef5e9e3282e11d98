/**
 * What the quoting engine reads from the warehouse: every active package with its models loaded,
 * the ready units per model, and the confirmed bookings overlapping some dates.
 */
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { HOLDING_STATES, type BookingState } from '$lib/bookings/states';
import type { LoadedPackage } from '$lib/inventory/types';
import type { ModelKey, Reservation } from '$lib/quotes/availability';
import { Booking, BookingLine, StockUnit } from '../db/models';
import { CATALOGUE, cached, invalidate } from '../cache';
import { listLoadedPackages } from './inventory-packages';

/** Call after any write to packages, models or stock units. */
export function catalogueChanged(): void {
	invalidate(CATALOGUE);
}

/** Every package with its models, cached briefly: the desk re-evaluates on each keystroke. */
export async function loadedPackages(where: { ids?: number[]; activeOnly?: boolean } = {}): Promise<LoadedPackage[]> {
	let all = await cached(`${CATALOGUE}packages`, listLoadedPackages);
	if (where.ids?.some((id) => !all.some((p) => p.id === id))) {
		catalogueChanged(); // a package newer than the cached list
		all = await cached(`${CATALOGUE}packages`, listLoadedPackages);
	}
	return all.filter((p) => (!where.activeOnly || p.active) && (!where.ids || where.ids.includes(p.id)));
}

/**
 * Units that can be hired, per model: ready, and not still out on a booking that ended before today
 * (a unit out late may not be back in time, so it is not offered). Units in repair or retired are
 * not offered either.
 */
export async function unitsInService(transaction?: Transaction, today = new Date().toISOString().slice(0, 10)): Promise<Partial<Record<ModelKey, number>>> {
	const rows = await StockUnit.sequelize!.query<{ modelType: string; modelId: number; units: number }>(
		`SELECT modelType, COALESCE(loudspeakerModelId, amplifierModelId) AS modelId, COUNT(*) AS units
		   FROM stock_units s
		  WHERE s.status = 'ready'
		    AND NOT EXISTS (SELECT 1 FROM booking_units bu JOIN bookings b ON b.id = bu.bookingId
		                     WHERE bu.stockUnitId = s.id AND bu.dispatchedAt IS NOT NULL AND bu.returnedAt IS NULL
		                       AND b.endDate < :today)
		  GROUP BY modelType, modelId`,
		{ type: QueryTypes.SELECT, transaction, replacements: { today } }
	);
	const counts: Partial<Record<ModelKey, number>> = {};
	for (const r of rows) counts[`${r.modelType}:${r.modelId}` as ModelKey] = Number(r.units);
	return counts;
}

/** Bookings holding stock (confirmed or out) sharing at least one day with the dates (optionally leaving one quote out). */
export async function reservationsOverlapping(
	startDate: string,
	endDate: string,
	options: { excludeQuoteId?: number; transaction?: Transaction } = {}
): Promise<Reservation[]> {
	const bookings = await Booking.findAll({
		where: {
			status: HOLDING_STATES as BookingState[],
			startDate: { [Op.lte]: endDate },
			endDate: { [Op.gte]: startDate },
			...(options.excludeQuoteId ? { quoteId: { [Op.ne]: options.excludeQuoteId } } : {})
		},
		include: [{ model: BookingLine, as: 'lines' }],
		transaction: options.transaction
	});
	return bookings.map((b) => {
		const quantities: Reservation['quantities'] = {};
		for (const line of (b as Booking & { lines: BookingLine[] }).lines) {
			const key = `${line.modelType}:${line.modelId}` as ModelKey;
			quantities[key] = (quantities[key] ?? 0) + line.quantity;
		}
		return { startDate: b.startDate, endDate: b.endDate, quantities };
	});
}
