/**
 * Bookings as the warehouse works them: the list with each booking's state, and the pick list (what
 * to load per model, which serials are reserved, out, back or still missing).
 */
import { Op, type WhereOptions } from 'sequelize';
import { HOLDING_STATES, progressInWords, type BookingState } from '$lib/bookings/states';
import { quoteReference } from '$lib/quotes/reference';
import { db, AmplifierModel, Booking, BookingLine, BookingUnit, Client, LoudspeakerModel, Quote, StockUnit } from '../db';
import { DomainError } from './errors';
import type { BookingSummary, PickLine, UnitOnBooking } from '$lib/bookings/types';

export type { BookingSummary, PickLine, UnitOnBooking };

type Loaded = Booking & { lines: BookingLine[]; units: BookingUnit[]; quote: Quote & { client: Client } };

function summaryOf(x: Loaded): BookingSummary {
	const count = (type: string) => x.lines.filter((l) => l.modelType === type).reduce((s, l) => s + l.quantity, 0);
	const progress = {
		state: x.status,
		needed: count('loudspeaker') + count('amplifier'),
		dispatched: x.units.filter((u) => u.dispatchedAt).length,
		returned: x.units.filter((u) => u.returnedAt).length
	};
	return {
		id: x.id,
		quoteId: x.quote.id,
		reference: quoteReference(x.quote.id),
		eventName: x.quote.eventName,
		clientName: x.quote.client.name,
		clientId: x.quote.clientId,
		startDate: x.startDate,
		endDate: x.endDate,
		state: x.status,
		stateWords: progressInWords(progress),
		cabinets: count('loudspeaker'),
		amplifiers: count('amplifier'),
		needed: progress.needed,
		reserved: x.units.filter((u) => !u.dispatchedAt).length,
		dispatched: progress.dispatched,
		returned: progress.returned
	};
}

/**
 * Bookings with their lines and units, soonest first. Lines and units are read in one query each for
 * all the bookings shown: joining them to the bookings multiplied the rows (lines × units per hire)
 * and cost seconds at thousands of hires (see tests/bench, larger catalogues).
 */
async function loadBookings(
	where: WhereOptions<Booking>,
	clientId?: number,
	limit?: number
): Promise<BookingSummary[]> {
	const bookings = await Booking.findAll({
		where,
		include: [
			{
				model: Quote,
				as: 'quote',
				attributes: ['id', 'eventName', 'clientId'],
				...(clientId ? { where: { clientId } } : {}),
				include: [{ model: Client, as: 'client', attributes: ['name'] }]
			}
		],
		order: [['startDate', 'ASC'], ['id', 'ASC']],
		...(limit ? { limit } : {})
	});
	if (bookings.length === 0) return [];
	const ids = bookings.map((b) => b.id);
	const [lines, units] = await Promise.all([
		BookingLine.findAll({ where: { bookingId: ids } }),
		BookingUnit.findAll({ where: { bookingId: ids }, attributes: ['bookingId', 'stockUnitId', 'dispatchedAt', 'returnedAt'] })
	]);
	const linesOf = groupBy(lines, (l) => l.bookingId);
	const unitsOf = groupBy(units, (u) => u.bookingId);
	return bookings.map((b) =>
		summaryOf(Object.assign(b, { lines: linesOf.get(b.id) ?? [], units: unitsOf.get(b.id) ?? [] }) as Loaded)
	);
}

function groupBy<T>(rows: readonly T[], key: (row: T) => number): Map<number, T[]> {
	const groups = new Map<number, T[]>();
	for (const row of rows) {
		const k = key(row);
		const list = groups.get(k);
		if (list) list.push(row);
		else groups.set(k, [row]);
	}
	return groups;
}

function workingListWhere(fromDate: string, until?: string): WhereOptions<Booking> {
	const confirmed = until
		? { status: 'confirmed', endDate: { [Op.gte]: fromDate }, startDate: { [Op.lte]: until } }
		: { status: 'confirmed', endDate: { [Op.gte]: fromDate } };
	return { [Op.or]: [{ status: ['out', 'back'] }, confirmed] } as WhereOptions<Booking>;
}

/**
 * The warehouse's working list: everything out or back (whatever its dates) and what is confirmed
 * from a date on (starting by `until`, when given), at most `limit` of them.
 */
export function listBookings(
	fromDate: string,
	options: { until?: string; limit?: number } = {}
): Promise<BookingSummary[]> {
	return loadBookings(workingListWhere(fromDate, options.until), undefined, options.limit);
}

/** How many bookings the working list holds in all (the page shows the first few hundred). */
export function countBookings(fromDate: string): Promise<number> {
	return Booking.count({ where: workingListWhere(fromDate) });
}

/** Every booking, optionally in one state, or only one client organisation's. */
export function allBookings(options: { state?: BookingState; clientId?: number } = {}): Promise<BookingSummary[]> {
	return loadBookings(options.state ? { status: options.state } : {}, options.clientId);
}

export async function bookingSummary(bookingId: number, clientId?: number): Promise<BookingSummary> {
	const [found] = await loadBookings({ id: bookingId }, clientId);
	if (!found) throw new DomainError(404, 'No such booking.');
	return found;
}

/** Units reserved or out on another holding booking that shares a day with this one. */
async function busyUnitIds(booking: Booking): Promise<Set<number>> {
	const rows = await BookingUnit.findAll({
		where: { returnedAt: null },
		include: [{ model: Booking, as: 'booking', where: { status: HOLDING_STATES as BookingState[], id: { [Op.ne]: booking.id } }, attributes: ['startDate', 'endDate'] }],
		attributes: ['stockUnitId', 'dispatchedAt']
	});
	return new Set(
		rows
			.filter((r) => {
				const b = (r as BookingUnit & { booking: Booking }).booking;
				return r.dispatchedAt || (b.startDate <= booking.endDate && b.endDate >= booking.startDate);
			})
			.map((r) => r.stockUnitId)
	);
}

export async function getPickList(bookingId: number): Promise<{ booking: BookingSummary; lines: PickLine[]; siteAddress: string }> {
	const booking = await Booking.findByPk(bookingId);
	if (!booking || booking.status === 'cancelled') throw new DomainError(404, 'No such booking.');
	const [summary, lines, mine, busy] = await Promise.all([
		bookingSummary(bookingId),
		BookingLine.findAll({ where: { bookingId } }),
		BookingUnit.findAll({ where: { bookingId }, include: [{ model: StockUnit, as: 'unit' }] }),
		busyUnitIds(booking)
	]);
	const mineIds = new Set(mine.map((m) => m.stockUnitId));
	const result: PickLine[] = [];
	for (const line of lines) {
		const column = line.modelType === 'loudspeaker' ? 'loudspeakerModelId' : 'amplifierModelId';
		const [model, ready] = await Promise.all([
			line.modelType === 'loudspeaker'
				? LoudspeakerModel.findByPk(line.modelId, { attributes: ['name'] })
				: AmplifierModel.findByPk(line.modelId, { attributes: ['name'] }),
			StockUnit.findAll({ where: { [column]: line.modelId, status: 'ready' }, order: [['serial', 'ASC']] })
		]);
		const units: UnitOnBooking[] = mine
			.map((m) => ({ row: m, unit: (m as BookingUnit & { unit: StockUnit }).unit }))
			.filter(({ unit }) => unit[column] === line.modelId)
			.map(({ row, unit }) => ({ id: unit.id, serial: unit.serial, location: unit.location, on: row.returnedAt ? 'back' : row.dispatchedAt ? 'out' : 'reserved' }) as const)
			.sort((a, b) => a.serial.localeCompare(b.serial));
		result.push({
			modelType: line.modelType,
			modelId: line.modelId,
			name: model?.name ?? `#${line.modelId}`,
			quantity: line.quantity,
			units,
			missing: Math.max(0, line.quantity - units.filter((u) => u.on !== 'reserved').length),
			candidates: ready.filter((u) => !busy.has(u.id) && !mineIds.has(u.id)).map((u) => ({ id: u.id, serial: u.serial, location: u.location }))
		});
	}
	return { booking: summary, lines: result, siteAddress: booking.siteAddress };
}

/**
 * Reserves serials for a booking ahead of loading (units already out or back stay as they are); each
 * must be ready, of a model on the list, and free on the dates.
 */
export async function assignUnits(bookingId: number, stockUnitIds: number[]): Promise<void> {
	const { booking, lines } = await getPickList(bookingId);
	if (!HOLDING_STATES.includes(booking.state)) throw new DomainError(409, `This booking is ${booking.state}: nothing more can be reserved for it.`);
	const errors: string[] = [];
	for (const line of lines) {
		const kept = line.units.filter((u) => u.on !== 'reserved' || stockUnitIds.includes(u.id)).length;
		const chosen = line.candidates.filter((c) => stockUnitIds.includes(c.id)).length + kept;
		if (chosen > line.quantity) errors.push(`${line.name}: ${chosen} chosen, the booking needs ${line.quantity}`);
	}
	const known = new Set(lines.flatMap((l) => [...l.candidates.map((c) => c.id), ...l.units.map((u) => u.id)]));
	if (stockUnitIds.some((id) => !known.has(id))) errors.push('Some units are not ready, not on this list, or already out on those dates');
	if (errors.length) throw new DomainError(409, errors.join('. '));
	await db().transaction(async (transaction) => {
		// Lock the units so two bookings reserving the same serial at once cannot both succeed.
		await StockUnit.findAll({ where: { id: stockUnitIds }, transaction, lock: transaction.LOCK.UPDATE, order: [['id', 'ASC']] });
		const row = (await Booking.findByPk(bookingId, { transaction }))!;
		const taken = await BookingUnit.count({
			where: { stockUnitId: stockUnitIds, returnedAt: null },
			include: [{ model: Booking, as: 'booking', where: { status: HOLDING_STATES as BookingState[], id: { [Op.ne]: bookingId }, startDate: { [Op.lte]: row.endDate }, endDate: { [Op.gte]: row.startDate } }, attributes: [] }],
			transaction
		});
		if (taken > 0) throw new DomainError(409, 'Another booking took one of those units meanwhile; reload the list.');
		await BookingUnit.destroy({ where: { bookingId, dispatchedAt: null }, transaction });
		const already = new Set((await BookingUnit.findAll({ where: { bookingId }, transaction })).map((r) => r.stockUnitId));
		const fresh = stockUnitIds.filter((id) => !already.has(id));
		await BookingUnit.bulkCreate(fresh.map((stockUnitId) => ({ bookingId, stockUnitId })), { transaction });
	});
}
