/**
 * What the quoting engine reads from the warehouse: every active package with its models loaded,
 * the ready units per model, and the confirmed bookings overlapping some dates.
 */
import { Op, QueryTypes, type Transaction } from 'sequelize';
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

/** Ready units per model. Units in repair or retired are not offered for hire. */
export async function unitsInService(transaction?: Transaction): Promise<Partial<Record<ModelKey, number>>> {
	const rows = await StockUnit.sequelize!.query<{ modelType: string; modelId: number; units: number }>(
		`SELECT modelType, COALESCE(loudspeakerModelId, amplifierModelId) AS modelId, COUNT(*) AS units
		   FROM stock_units WHERE status = 'ready' GROUP BY modelType, modelId`,
		{ type: QueryTypes.SELECT, transaction }
	);
	const counts: Partial<Record<ModelKey, number>> = {};
	for (const r of rows) counts[`${r.modelType}:${r.modelId}` as ModelKey] = Number(r.units);
	return counts;
}

/** Confirmed bookings sharing at least one day with the dates (optionally leaving one quote out). */
export async function reservationsOverlapping(
	startDate: string,
	endDate: string,
	options: { excludeQuoteId?: number; transaction?: Transaction } = {}
): Promise<Reservation[]> {
	const bookings = await Booking.findAll({
		where: {
			status: 'confirmed',
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
