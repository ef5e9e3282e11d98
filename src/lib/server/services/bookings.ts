/**
 * Reserving stock for a paid hire. Two payments racing for the last units must not both win, so the
 * reservation runs in the caller's transaction, locks the rows of every model it needs (always in
 * the same order, so two reservations cannot deadlock) before it reads stock and bookings, and only
 * then writes the booking. Under READ COMMITTED the reads after the lock see every booking that the
 * previous lock holder committed.
 */
import { Op, Transaction } from 'sequelize';
import { checkAvailability, type ModelKey, type Shortfall } from '$lib/quotes/availability';
import { db, AmplifierModel, Booking, BookingLine, LoudspeakerModel, QuoteVersion } from '../db';
import { bumpStamp } from '../cache-stamps';
import { reservationsOverlapping, unitsInService } from './catalogue';
import type { ModelType } from '$lib/inventory/types';

export type Reservation =
	| { ok: true; bookingId: number }
	| { ok: false; shortfalls: (Shortfall & { name: string })[] };

export function reservationTransaction<T>(work: (t: Transaction) => Promise<T>): Promise<T> {
	return db().transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, work);
}

export async function reserveStockForQuote(quoteId: number, version: number, transaction: Transaction): Promise<Reservation> {
	const quoted = await QuoteVersion.findOne({ where: { quoteId, version }, transaction });
	if (!quoted) throw new Error(`quote ${quoteId} has no version ${version}`);
	const bom = quoted.evaluation.billOfMaterials;
	const { needed, names } = linesOf(quoted);

	const lock = { transaction, lock: Transaction.LOCK.UPDATE, order: [['id', 'ASC']] as [string, string][] };
	await LoudspeakerModel.findAll({ where: { id: { [Op.in]: bom.loudspeakers.map((l) => l.modelId) } }, ...lock });
	await AmplifierModel.findAll({ where: { id: { [Op.in]: bom.amplifiers.map((a) => a.modelId) } }, ...lock });

	const [inService, reservations] = await Promise.all([
		unitsInService(transaction),
		reservationsOverlapping(quoted.startDate, quoted.endDate, { excludeQuoteId: quoteId, transaction })
	]);
	const stock = checkAvailability(needed, inService, reservations, quoted.startDate, quoted.endDate);
	if (!stock.ok) {
		return { ok: false, shortfalls: stock.shortfalls.map((s) => ({ ...s, name: names.get(s.model) ?? s.model })) };
	}

	const [booking] = await Booking.upsert(
		{ quoteId, status: 'confirmed', startDate: quoted.startDate, endDate: quoted.endDate },
		{ transaction }
	);
	const bookingId = booking.id ?? (await Booking.findOne({ where: { quoteId }, transaction }))!.id;
	await BookingLine.destroy({ where: { bookingId }, transaction });
	await BookingLine.bulkCreate(
		(Object.entries(needed) as [ModelKey, number][]).map(([key, quantity]) => {
			const [modelType, modelId] = key.split(':') as [ModelType, string];
			return { bookingId, modelType, modelId: Number(modelId), quantity };
		}),
		{ transaction }
	);
	await bumpStamp('bookings', transaction);
	return { ok: true, bookingId };
}

/** The units a version's package or system takes, per model, with the models' names. */
function linesOf(quoted: QuoteVersion): { needed: Partial<Record<ModelKey, number>>; names: Map<ModelKey, string> } {
	const bom = quoted.evaluation.billOfMaterials;
	const needed: Partial<Record<ModelKey, number>> = {};
	const names = new Map<ModelKey, string>();
	for (const l of bom.loudspeakers) {
		needed[`loudspeaker:${l.modelId}`] = l.count;
		names.set(`loudspeaker:${l.modelId}`, l.name);
	}
	for (const a of bom.amplifiers) {
		needed[`amplifier:${a.modelId}`] = a.count;
		names.set(`amplifier:${a.modelId}`, a.name);
	}
	return { needed, names };
}

/**
 * What a quote version would be short of if it were booked now, read without locks: the early
 * refusal at acceptance. The reservation at deposit re-checks under row locks, so this never
 * guarantees stock; it only stops a client accepting what is already gone.
 */
export async function shortfallsNow(quoteId: number, version: number): Promise<(Shortfall & { name: string })[]> {
	const quoted = await QuoteVersion.findOne({ where: { quoteId, version } });
	if (!quoted) return [];
	const { needed, names } = linesOf(quoted);
	const [inService, reservations] = await Promise.all([unitsInService(), reservationsOverlapping(quoted.startDate, quoted.endDate, { excludeQuoteId: quoteId })]);
	return checkAvailability(needed, inService, reservations, quoted.startDate, quoted.endDate).shortfalls.map((s) => ({ ...s, name: names.get(s.model) ?? s.model }));
}

/** Frees the stock of a cancelled hire. */
export async function releaseBooking(quoteId: number, transaction: Transaction): Promise<void> {
	await Booking.update({ status: 'cancelled' }, { where: { quoteId }, transaction });
	await bumpStamp('bookings', transaction);
}
