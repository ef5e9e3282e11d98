/** What goes out and comes back when: confirmed bookings as pick lists, then serials as they are assigned. */
import { Op, QueryTypes } from 'sequelize';
import { quoteReference } from '$lib/quotes/reference';
import { db, AmplifierModel, Booking, BookingLine, BookingUnit, LoudspeakerModel, StockUnit } from '../db';
import { DomainError } from './errors';

export interface PickLine {
	modelType: 'loudspeaker' | 'amplifier';
	modelId: number;
	name: string;
	quantity: number;
	assigned: { id: number; serial: string }[];
	candidates: { id: number; serial: string; location: string }[];
}

export interface BookingSummary {
	id: number;
	quoteId: number;
	reference: string;
	eventName: string;
	clientName: string;
	startDate: string;
	endDate: string;
	cabinets: number;
	amplifiers: number;
	assignedUnits: number;
}

/**
 * Confirmed hires ending on or after the date (or one hire by id), soonest first. Counts come from
 * sub-queries per hire (by index): joining every line to every assigned unit multiplied the rows per
 * hire and cost 2.4 s at 5,000 hires; a pick list read all hires to show one.
 */
export async function listBookings(
	fromDate: string,
	options: { bookingId?: number; until?: string; limit?: number } = {}
): Promise<BookingSummary[]> {
	const rows = await Booking.sequelize!.query<BookingListRow>(
		`SELECT b.id, b.quoteId, q.eventName, c.name AS clientName, b.startDate, b.endDate,
		        (SELECT COALESCE(SUM(quantity), 0) FROM booking_lines WHERE bookingId = b.id AND modelType = 'loudspeaker') AS cabinets,
		        (SELECT COALESCE(SUM(quantity), 0) FROM booking_lines WHERE bookingId = b.id AND modelType = 'amplifier') AS amplifiers,
		        (SELECT COUNT(*) FROM booking_units WHERE bookingId = b.id) AS assignedUnits
		   FROM bookings b
		   JOIN quotes q ON q.id = b.quoteId
		   JOIN clients c ON c.id = q.clientId
		  WHERE b.status = 'confirmed' AND b.endDate >= :fromDate
		        ${options.bookingId ? 'AND b.id = :bookingId' : ''} ${options.until ? 'AND b.startDate <= :until' : ''}
		  ORDER BY b.startDate ASC, b.id ASC
		  ${options.limit ? 'LIMIT :limit' : ''}`,
		{
			type: QueryTypes.SELECT,
			replacements: { fromDate, bookingId: options.bookingId ?? null, until: options.until ?? null, limit: options.limit ?? null }
		}
	);
	return rows.map((r) => ({
		id: r.id,
		quoteId: r.quoteId,
		reference: quoteReference(r.quoteId),
		eventName: r.eventName,
		clientName: r.clientName,
		startDate: dateOnly(r.startDate),
		endDate: dateOnly(r.endDate),
		cabinets: Number(r.cabinets),
		amplifiers: Number(r.amplifiers),
		assignedUnits: Number(r.assignedUnits)
	}));
}

/** How many confirmed hires end on or after the date. */
export async function countBookings(fromDate: string): Promise<number> {
	return Booking.count({ where: { status: 'confirmed', endDate: { [Op.gte]: fromDate } } });
}

interface BookingListRow {
	id: number;
	quoteId: number;
	eventName: string;
	clientName: string;
	startDate: string | Date;
	endDate: string | Date;
	cabinets: number | string;
	amplifiers: number | string;
	assignedUnits: number | string;
}

/** A DATE column as YYYY-MM-DD, whether the driver hands back text or a Date at midnight UTC. */
function dateOnly(value: string | Date): string {
	return value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);
}

/** Units already going out on another confirmed booking that shares a day with this one. */
async function busyUnitIds(booking: Booking): Promise<Set<number>> {
	const rows = await BookingUnit.findAll({
		include: [{ model: Booking, as: 'booking', where: { status: 'confirmed', id: { [Op.ne]: booking.id }, startDate: { [Op.lte]: booking.endDate }, endDate: { [Op.gte]: booking.startDate } }, attributes: [] }],
		attributes: ['stockUnitId']
	});
	return new Set(rows.map((r) => r.stockUnitId));
}

export async function getPickList(bookingId: number): Promise<{ booking: BookingSummary; lines: PickLine[] }> {
	const booking = await Booking.findByPk(bookingId);
	if (!booking || booking.status !== 'confirmed') throw new DomainError(404, 'No such booking.');
	const [summary] = await listBookings('0000-01-01', { bookingId });
	const [lines, assigned, busy] = await Promise.all([
		BookingLine.findAll({ where: { bookingId } }),
		BookingUnit.findAll({ where: { bookingId } }),
		busyUnitIds(booking)
	]);
	const assignedIds = new Set(assigned.map((a) => a.stockUnitId));
	const result: PickLine[] = [];
	for (const line of lines) {
		const column = line.modelType === 'loudspeaker' ? 'loudspeakerModelId' : 'amplifierModelId';
		const [model, units] = await Promise.all([
			line.modelType === 'loudspeaker'
				? LoudspeakerModel.findByPk(line.modelId, { attributes: ['name'] })
				: AmplifierModel.findByPk(line.modelId, { attributes: ['name'] }),
			StockUnit.findAll({ where: { [column]: line.modelId, status: 'ready' }, order: [['serial', 'ASC']] })
		]);
		result.push({
			modelType: line.modelType,
			modelId: line.modelId,
			name: model?.name ?? `#${line.modelId}`,
			quantity: line.quantity,
			assigned: units.filter((u) => assignedIds.has(u.id)).map((u) => ({ id: u.id, serial: u.serial })),
			candidates: units.filter((u) => !busy.has(u.id)).map((u) => ({ id: u.id, serial: u.serial, location: u.location }))
		});
	}
	return { booking: summary, lines: result };
}

/** Replaces the serials assigned to a booking; each must be ready, of a model on the list, and free on the dates. */
export async function assignUnits(bookingId: number, stockUnitIds: number[]): Promise<void> {
	const { lines } = await getPickList(bookingId);
	const errors: string[] = [];
	for (const line of lines) {
		const chosen = line.candidates.filter((c) => stockUnitIds.includes(c.id));
		if (chosen.length > line.quantity) errors.push(`${line.name}: ${chosen.length} chosen, the booking needs ${line.quantity}`);
	}
	const known = new Set(lines.flatMap((l) => l.candidates.map((c) => c.id)));
	const unknown = stockUnitIds.filter((id) => !known.has(id));
	if (unknown.length) errors.push('Some units are not ready, not on this list, or already out on those dates');
	if (errors.length) throw new DomainError(409, errors.join('. '));
	await db().transaction(async (transaction) => {
		// Lock the units so two bookings assigning the same serial at once cannot both succeed.
		await StockUnit.findAll({ where: { id: stockUnitIds }, transaction, lock: transaction.LOCK.UPDATE, order: [['id', 'ASC']] });
		const booking = (await Booking.findByPk(bookingId, { transaction }))!;
		const taken = await BookingUnit.count({
			where: { stockUnitId: stockUnitIds },
			include: [{ model: Booking, as: 'booking', where: { status: 'confirmed', id: { [Op.ne]: bookingId }, startDate: { [Op.lte]: booking.endDate }, endDate: { [Op.gte]: booking.startDate } }, attributes: [] }],
			transaction
		});
		if (taken > 0) throw new DomainError(409, 'Another booking took one of those units meanwhile; reload the list.');
		await BookingUnit.destroy({ where: { bookingId }, transaction });
		await BookingUnit.bulkCreate(stockUnitIds.map((stockUnitId) => ({ bookingId, stockUnitId })), { transaction });
	});
}
