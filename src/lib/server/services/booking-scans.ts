/**
 * Scanning units out and back. Each scan runs in one READ COMMITTED transaction that locks the
 * booking row, then the unit's row, before it reads anything else: two people scanning the same unit
 * onto two bookings queue on the unit's lock, and the second then sees the first one's committed
 * dispatch and is refused with that booking's reference. Locks are always taken booking first, unit
 * second, so scans cannot deadlock each other.
 */
import { Op, Transaction } from 'sequelize';
import { dispatchRefusal, returnRefusal } from '$lib/bookings/scan-rules';
import { testDueDate, testStatus } from '$lib/bookings/safety-tests';
import { HOLDING_STATES, stateAfterScan, type BookingState } from '$lib/bookings/states';
import { quoteReference } from '$lib/quotes/reference';
import { db, AmplifierModel, Booking, BookingEvent, BookingLine, BookingUnit, LoudspeakerModel, StockUnit } from '../db';
import { BOOKINGS, CATALOGUE, invalidate } from '../cache';
import type { SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { testIntervals } from './safety-tests';

export interface ScanResult {
	serial: string;
	modelName: string;
	state: BookingState;
	/** What happened, in words, for the message beside the scan field. */
	message: string;
}

const modelKeyOf = (u: StockUnit) => `${u.modelType}:${u.loudspeakerModelId ?? u.amplifierModelId}`;

function scanTransaction<T>(work: (t: Transaction) => Promise<T>): Promise<T> {
	return db().transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (t) => {
		t.afterCommit(() => {
			invalidate(BOOKINGS);
			invalidate(CATALOGUE);
		});
		return work(t);
	});
}

async function lockBooking(bookingId: number, transaction: Transaction): Promise<Booking> {
	const booking = await Booking.findByPk(bookingId, { transaction, lock: Transaction.LOCK.UPDATE });
	if (!booking) throw new DomainError(404, 'No such booking.');
	return booking;
}

async function lockUnit(serial: string, transaction: Transaction): Promise<StockUnit | null> {
	return StockUnit.findOne({ where: { serial }, transaction, lock: Transaction.LOCK.UPDATE });
}

async function modelName(unit: StockUnit, transaction: Transaction): Promise<string> {
	const model =
		unit.modelType === 'loudspeaker'
			? await LoudspeakerModel.findByPk(unit.loudspeakerModelId!, { attributes: ['name'], transaction })
			: await AmplifierModel.findByPk(unit.amplifierModelId!, { attributes: ['name'], transaction });
	return model?.name ?? unit.serial;
}

/** Counts for the state machine: needed, scanned out (ever) and scanned back on this booking. */
async function progressOf(booking: Booking, transaction: Transaction) {
	const [lines, rows] = await Promise.all([
		BookingLine.findAll({ where: { bookingId: booking.id }, transaction }),
		BookingUnit.findAll({ where: { bookingId: booking.id }, transaction })
	]);
	return {
		state: booking.status,
		needed: lines.reduce((s, l) => s + l.quantity, 0),
		dispatched: rows.filter((r) => r.dispatchedAt).length,
		returned: rows.filter((r) => r.returnedAt).length
	};
}

async function moveState(booking: Booking, userId: number, transaction: Transaction): Promise<BookingState> {
	const next = stateAfterScan(await progressOf(booking, transaction));
	if (next !== booking.status) {
		await booking.update({ status: next }, { transaction });
		await BookingEvent.create({ bookingId: booking.id, kind: 'state', stockUnitId: null, state: next, userId }, { transaction });
	}
	return next;
}

/** Another booking holding this unit: out and not back, or reserved on overlapping dates. */
async function otherHolder(unitId: number, booking: Booking, transaction: Transaction) {
	const rows = await BookingUnit.findAll({
		where: { stockUnitId: unitId, bookingId: { [Op.ne]: booking.id }, returnedAt: null },
		include: [{ model: Booking, as: 'booking', attributes: ['quoteId', 'status', 'startDate', 'endDate'] }],
		transaction
	});
	const ref = (r: BookingUnit) => quoteReference((r as BookingUnit & { booking: Booking }).booking.quoteId);
	const out = rows.find((r) => r.dispatchedAt);
	const reserved = rows.find((r) => {
		const b = (r as BookingUnit & { booking: Booking }).booking;
		return !r.dispatchedAt && HOLDING_STATES.includes(b.status) && b.startDate <= booking.endDate && b.endDate >= booking.startDate;
	});
	return { outOn: out ? ref(out) : null, reservedFor: reserved ? ref(reserved) : null };
}

export async function dispatchUnit(bookingId: number, serial: string, user: SessionUser, today: string): Promise<ScanResult> {
	const intervals = await testIntervals(); // settings are read before the transaction takes its locks
	return scanTransaction(async (transaction) => {
		const booking = await lockBooking(bookingId, transaction);
		const unit = await lockUnit(serial, transaction);
		const name = unit ? await modelName(unit, transaction) : '';
		const [lines, mine] = await Promise.all([
			BookingLine.findAll({ where: { bookingId }, transaction }),
			BookingUnit.findAll({ where: { bookingId }, include: [{ model: StockUnit, as: 'unit' }], transaction })
		]);
		const key = unit ? modelKeyOf(unit) : '';
		const line = lines.find((l) => `${l.modelType}:${l.modelId}` === key);
		const sameModel = mine.filter((r) => modelKeyOf((r as BookingUnit & { unit: StockUnit }).unit) === key);
		const here = unit ? mine.find((r) => r.stockUnitId === unit.id) : undefined;
		const holder = unit ? await otherHolder(unit.id, booking, transaction) : { outOn: null, reservedFor: null };
		const days = unit ? intervals.days(unit.modelType, (unit.loudspeakerModelId ?? unit.amplifierModelId)!) : 0;
		const refusal = dispatchRefusal({
			bookingState: booking.status,
			serial,
			unit: unit ? { status: unit.status, modelName: name } : null,
			line: line ? { needed: line.quantity, dispatched: sameModel.filter((r) => r.dispatchedAt && !r.returnedAt).length } : null,
			outHere: Boolean(here?.dispatchedAt && !here.returnedAt),
			...holder,
			test: unit ? testStatus(unit.lastTestedAt, days, today) : 'in-date',
			testDue: unit ? testDueDate(unit.lastTestedAt, days) : null
		});
		if (refusal) throw new DomainError(409, refusal, { serial: [refusal] });

		const now = new Date();
		if (here) {
			await here.update({ dispatchedAt: now, dispatchedById: user.id, returnedAt: null, returnedById: null }, { transaction });
		} else {
			// A substitute: it takes the place of a reserved unit of the same model that has not gone out.
			const planned = sameModel.filter((r) => !r.dispatchedAt);
			const held = sameModel.filter((r) => !r.returnedAt);
			if (planned.length > 0 && held.length >= line!.quantity) await planned[0].destroy({ transaction });
			await BookingUnit.create({ bookingId, stockUnitId: unit!.id, dispatchedAt: now, dispatchedById: user.id }, { transaction });
		}
		await BookingEvent.create({ bookingId, kind: 'dispatch', stockUnitId: unit!.id, state: null, userId: user.id }, { transaction });
		const state = await moveState(booking, user.id, transaction);
		return { serial: unit!.serial, modelName: name, state, message: `${unit!.serial} (${name}) is out.` };
	});
}

export async function returnUnit(bookingId: number, serial: string, user: SessionUser): Promise<ScanResult> {
	return scanTransaction(async (transaction) => {
		const booking = await lockBooking(bookingId, transaction);
		const unit = await lockUnit(serial, transaction);
		const here = unit ? await BookingUnit.findOne({ where: { bookingId, stockUnitId: unit.id }, transaction }) : null;
		const refusal = returnRefusal({
			bookingState: booking.status,
			serial,
			known: Boolean(unit),
			outHere: Boolean(here?.dispatchedAt && !here.returnedAt),
			returnedHere: Boolean(here?.returnedAt)
		});
		if (refusal) throw new DomainError(409, refusal, { serial: [refusal] });
		await here!.update({ returnedAt: new Date(), returnedById: user.id }, { transaction });
		await BookingEvent.create({ bookingId, kind: 'return', stockUnitId: unit!.id, state: null, userId: user.id }, { transaction });
		const state = await moveState(booking, user.id, transaction);
		const name = await modelName(unit!, transaction);
		return { serial: unit!.serial, modelName: name, state, message: `${unit!.serial} (${name}) is back.` };
	});
}
