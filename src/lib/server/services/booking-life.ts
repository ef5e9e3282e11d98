/** A booking's life beyond the scans: closing it, its delivery address and log, and units not back in time. */
import { Op } from 'sequelize';
import { closeRefusal, progressInWords, type BookingState } from '$lib/bookings/states';
import { quoteReference } from '$lib/quotes/reference';
import { AmplifierModel, Booking, BookingEvent, BookingUnit, Client, LoudspeakerModel, Quote, QuoteVersion, StockUnit, User } from '../db';
import { BOOKINGS, invalidate } from '../cache';
import type { SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { bookingSummary, getPickList } from './pick-lists';

export async function closeBooking(bookingId: number, user: SessionUser): Promise<BookingState> {
	const s = await bookingSummary(bookingId);
	const refusal = closeRefusal(s);
	if (refusal) throw new DomainError(409, refusal);
	await Booking.sequelize!.transaction(async (transaction) => {
		const [count] = await Booking.update({ status: 'closed' }, { where: { id: bookingId, status: s.state }, transaction });
		if (count === 0) throw new DomainError(409, 'The booking changed meanwhile; reload the page.');
		await BookingEvent.create({ bookingId, kind: 'state', stockUnitId: null, state: 'closed', userId: user.id }, { transaction });
	});
	invalidate(BOOKINGS);
	return 'closed';
}

export async function setSiteAddress(bookingId: number, siteAddress: string): Promise<void> {
	const [count] = await Booking.update({ siteAddress }, { where: { id: bookingId } });
	if (count === 0 && !(await Booking.findByPk(bookingId))) throw new DomainError(404, 'No such booking.');
}

export interface LogEntry {
	at: string;
	what: string;
	who: string;
}

/** Who did what and when: every scan and state change, newest first. */
export async function bookingLog(bookingId: number): Promise<LogEntry[]> {
	const events = await BookingEvent.findAll({ where: { bookingId }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 });
	const unitIds = [...new Set(events.map((e) => e.stockUnitId).filter((id): id is number => id !== null))];
	const userIds = [...new Set(events.map((e) => e.userId).filter((id): id is number => id !== null))];
	const [units, users] = await Promise.all([
		StockUnit.findAll({ where: { id: unitIds }, attributes: ['id', 'serial'] }),
		User.findAll({ where: { id: userIds }, attributes: ['id', 'name'] })
	]);
	const serial = (id: number | null) => units.find((u) => u.id === id)?.serial ?? 'a removed unit';
	return events.map((e) => ({
		at: e.createdAt.toISOString(),
		what: e.kind === 'dispatch' ? `${serial(e.stockUnitId)} out` : e.kind === 'return' ? `${serial(e.stockUnitId)} back` : `Booking ${e.state}`,
		who: users.find((u) => u.id === e.userId)?.name ?? '—'
	}));
}

export interface LateUnit {
	unitId: number;
	serial: string;
	modelName: string;
	bookingId: number;
	reference: string;
	eventName: string;
	endDate: string;
}

/** Units scanned out and not back although their booking ended before today: the missing list. */
export async function lateUnits(today: string): Promise<LateUnit[]> {
	const rows = await BookingUnit.findAll({
		where: { dispatchedAt: { [Op.ne]: null }, returnedAt: null },
		include: [
			{ model: Booking, as: 'booking', where: { endDate: { [Op.lt]: today } }, include: [{ model: Quote, as: 'quote', attributes: ['id', 'eventName'] }] },
			{
				model: StockUnit,
				as: 'unit',
				include: [
					{ model: LoudspeakerModel, as: 'loudspeaker', attributes: ['name'] },
					{ model: AmplifierModel, as: 'amplifier', attributes: ['name'] }
				]
			}
		]
	});
	return rows
		.map((r) => {
			const { booking, unit } = r as BookingUnit & { booking: Booking & { quote: Quote }; unit: StockUnit };
			return {
				unitId: unit.id,
				serial: unit.serial,
				modelName: unit.loudspeaker?.name ?? unit.amplifier?.name ?? '',
				bookingId: booking.id,
				reference: quoteReference(booking.quote.id),
				eventName: booking.quote.eventName,
				endDate: booking.endDate
			};
		})
		.sort((a, b) => a.endDate.localeCompare(b.endDate) || a.serial.localeCompare(b.serial));
}

/** Everything a delivery note prints: the pick list plus the client's contact and the quote's notes. */
export async function deliveryNote(bookingId: number) {
	const pick = await getPickList(bookingId);
	const quote = await Quote.findByPk(pick.booking.quoteId, { include: [{ model: Client, as: 'client' }] });
	const version = await QuoteVersion.findOne({ where: { quoteId: pick.booking.quoteId, version: quote!.currentVersion } });
	const client = (quote as Quote & { client: Client }).client;
	return {
		...pick,
		client: { name: client.name, contactName: client.contactName, email: client.email, phone: client.phone ?? '' },
		notes: version?.notes ?? ''
	};
}

/** A client's view of their hire: the state in plain words, nothing about serials or other hires. */
export async function bookingStateForClient(quoteId: number): Promise<{ state: BookingState; words: string; startDate: string; endDate: string } | null> {
	const booking = await Booking.findOne({ where: { quoteId } });
	if (!booking) return null;
	const s = await bookingSummary(booking.id);
	return { state: s.state, words: progressInWords(s), startDate: s.startDate, endDate: s.endDate };
}
