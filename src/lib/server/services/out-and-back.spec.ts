/**
 * The stock's life cycle against the test database: dispatch and return by serial (all or part),
 * refusals that change nothing, overdue electrical safety tests, damage → repair → ready, the
 * 20-way race for one unit, and availability counting units out late or in repair.
 */
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { anotherBooking, daysFromToday, makeBooking, today } from '../../../../tests/helpers/bookings';
import { checkAvailability } from '$lib/quotes/availability';
import { Booking, BookingEvent, BookingUnit, DamageReport, StockUnit } from '../db/models';
import { closeBooking, lateUnits } from './booking-life';
import { dispatchUnit, returnUnit } from './booking-scans';
import { unitsInService } from './catalogue';
import { listRepairs, recordRepair, reportDamage } from './damage-repairs';
import { DomainError } from './errors';
import { getPickList } from './pick-lists';
import { modelCalendar } from './availability-calendar';

useTestDatabase();

async function refusal(work: Promise<unknown>): Promise<DomainError> {
	const err = await work.then(() => null, (e: unknown) => e);
	expect(err).toBeInstanceOf(DomainError);
	return err as DomainError;
}

const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);

describe('booking life cycle', () => {
	it('confirmed → out in part → out in full → back in part → back → closed, each step logged with who and which unit', async () => {
		const b = await makeBooking({ cabinets: 2, amplifiers: 1 });
		const t = today();
		const first = await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, t);
		expect(first.state).toBe('out');
		let pick = await getPickList(b.booking.id);
		const speakers = pick.lines.find((l) => l.modelType === 'loudspeaker')!;
		expect(speakers.missing).toBe(1);
		expect(pick.booking.stateWords).toMatch(/Partly out: 1 of 3/);

		await dispatchUnit(b.booking.id, b.serials[1], b.warehouse, t);
		await dispatchUnit(b.booking.id, b.ampSerials[0], b.warehouse, t);
		pick = await getPickList(b.booking.id);
		expect(pick.lines.every((l) => l.missing === 0)).toBe(true);
		expect(pick.booking.stateWords).toMatch(/^Out: all 3 units/);

		await expect(closeBooking(b.booking.id, b.warehouse)).rejects.toThrow(/3 units are still out/);
		const partBack = await returnUnit(b.booking.id, b.serials[0], b.warehouse);
		expect(partBack.state).toBe('out');
		expect((await getPickList(b.booking.id)).booking.stateWords).toMatch(/Partly back: 1 of 3/);
		await returnUnit(b.booking.id, b.serials[1], b.warehouse);
		const last = await returnUnit(b.booking.id, b.ampSerials[0], b.warehouse);
		expect(last.state).toBe('back');
		expect(await closeBooking(b.booking.id, b.warehouse)).toBe('closed');

		const events = await BookingEvent.findAll({ where: { bookingId: b.booking.id }, order: [['id', 'ASC']] });
		expect(events.map((e) => e.kind === 'state' ? e.state : e.kind)).toEqual(['dispatch', 'out', 'dispatch', 'dispatch', 'return', 'return', 'return', 'back', 'closed']);
		expect(events.every((e) => e.userId === b.warehouse.id)).toBe(true);
		const rows = await BookingUnit.findAll({ where: { bookingId: b.booking.id } });
		expect(rows.every((r) => r.dispatchedById === b.warehouse.id && r.returnedById === b.warehouse.id && r.dispatchedAt && r.returnedAt)).toBe(true);
	});

	it('a booking sent out in part comes back in part and can be closed', async () => {
		const b = await makeBooking({ cabinets: 2, amplifiers: 1 });
		await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today());
		expect((await returnUnit(b.booking.id, b.serials[0], b.warehouse)).state).toBe('back');
		expect(await closeBooking(b.booking.id, b.warehouse)).toBe('closed');
		await expect(dispatchUnit(b.booking.id, b.serials[1], b.warehouse, today())).rejects.toThrow(/closed/);
	});

	it('wrong scans are refused with a reason and change nothing', async () => {
		const b = await makeBooking({ cabinets: 1, units: 2, amplifiers: 1 });
		const other = await makeBooking({ cabinets: 1 });
		const before = await BookingUnit.count({ where: { bookingId: b.booking.id } });
		expect((await refusal(dispatchUnit(b.booking.id, 'NO-SUCH-SERIAL', b.warehouse, today()))).message).toMatch(/No unit has the serial/);
		expect((await refusal(dispatchUnit(b.booking.id, other.serials[0], b.warehouse, today()))).message).toMatch(/does not need/);
		await StockUnit.update({ status: 'in-repair' }, { where: { serial: b.serials[1] } });
		expect((await refusal(dispatchUnit(b.booking.id, b.serials[1], b.warehouse, today()))).message).toMatch(/in repair/);
		await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today());
		expect((await refusal(dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today()))).message).toMatch(/already scanned out/);
		await StockUnit.update({ status: 'ready' }, { where: { serial: b.serials[1] } });
		expect((await refusal(dispatchUnit(b.booking.id, b.serials[1], b.warehouse, today()))).message).toMatch(/already out/);
		expect((await refusal(returnUnit(b.booking.id, b.serials[1], b.warehouse))).message).toMatch(/did not go out/);
		expect(await BookingUnit.count({ where: { bookingId: b.booking.id } })).toBe(before + 1);
	});

	it('a substitute of the same model takes the place of a reserved unit', async () => {
		const b = await makeBooking({ cabinets: 1, units: 2 });
		await BookingUnit.create({ bookingId: b.booking.id, stockUnitId: b.units[0].id });
		let line = (await getPickList(b.booking.id)).lines.find((l) => l.modelType === 'loudspeaker')!;
		expect(line.units).toEqual([expect.objectContaining({ serial: b.serials[0], on: 'reserved' })]);
		await dispatchUnit(b.booking.id, b.serials[1], b.warehouse, today());
		line = (await getPickList(b.booking.id)).lines.find((l) => l.modelType === 'loudspeaker')!;
		expect(line.units).toEqual([expect.objectContaining({ serial: b.serials[1], on: 'out' })]);
	});

	it('a unit reserved for another booking on the same dates is refused with that booking named', async () => {
		const b = await makeBooking({ cabinets: 1, units: 2 });
		const second = await anotherBooking(b);
		await BookingUnit.create({ bookingId: second.booking.id, stockUnitId: b.units[0].id });
		const err = await refusal(dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today()));
		expect(err.message).toContain(`Q-${String(second.quote.id).padStart(5, '0')}`);
	});
});

describe('electrical safety tests', () => {
	it('an overdue unit cannot be dispatched; a never-tested one neither; one tested today can', async () => {
		const b = await makeBooking({ cabinets: 2, tested: '2001-01-01' });
		const err = await refusal(dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today()));
		expect(err.message).toMatch(/overdue for its electrical safety test \(due 1 Jan 2002\)/);
		await StockUnit.update({ lastTestedAt: null }, { where: { serial: b.serials[0] } });
		expect((await refusal(dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today()))).message).toMatch(/no electrical safety test on record/);
		await StockUnit.update({ lastTestedAt: daysFromToday(-10) }, { where: { serial: b.serials[0] } });
		expect((await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today())).state).toBe('out');
		expect(await Booking.count({ where: { id: b.booking.id, status: 'out' } })).toBe(1);
	});
});

describe('damage and repair', () => {
	it('a damage report with a photo sends the unit to repair; a repair marked done returns it to ready', async () => {
		const b = await makeBooking({ cabinets: 1 });
		await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today());
		const unitId = b.units[0].id;
		await expect(reportDamage({ stockUnitId: unitId, bookingId: b.booking.id, notes: 'Grille dented', photo: null }, b.warehouse)).rejects.toThrow(/still out/);
		await returnUnit(b.booking.id, b.serials[0], b.warehouse);
		const bad = await refusal(reportDamage({ stockUnitId: unitId, bookingId: b.booking.id, notes: 'Grille dented', photo: { name: 'x.png', bytes: new TextEncoder().encode('<svg/>') } }, b.warehouse));
		expect(bad.status).toBe(422);
		expect(bad.errors?.photo?.[0]).toMatch(/not a JPEG, PNG or WebP/);
		expect((await StockUnit.findByPk(unitId))!.status).toBe('ready');

		await reportDamage({ stockUnitId: unitId, bookingId: b.booking.id, notes: 'Grille dented', photo: { name: '../../etc/dent.png', bytes: PNG } }, b.warehouse);
		expect((await StockUnit.findByPk(unitId))!.status).toBe('in-repair');
		const report = await DamageReport.findOne({ where: { stockUnitId: unitId } });
		expect(report).toMatchObject({ photoMimeType: 'image/png', photoOriginalName: 'dent.png' });

		await recordRepair(unitId, { description: 'Parts ordered', costMinor: 0, done: false }, b.warehouse);
		expect((await StockUnit.findByPk(unitId))!.status).toBe('in-repair');
		const done = await recordRepair(unitId, { description: 'New grille fitted', costMinor: 4250, done: true }, b.warehouse);
		expect(done.status).toBe('ready');
		expect((await listRepairs(unitId)).map((r) => [r.description, r.costMinor, r.done])).toEqual([
			['New grille fitted', 4250, true],
			['Parts ordered', 0, false]
		]);
	});
});

describe('the race for one unit', () => {
	it('20 scans of the same serial onto 20 bookings at once: exactly one wins, the others are told which booking has it', async () => {
		const b = await makeBooking({ cabinets: 1, units: 1 });
		const others = await Promise.all(Array.from({ length: 19 }, () => anotherBooking(b)));
		const bookingIds = [b.booking.id, ...others.map((o) => o.booking.id)];
		const results = await Promise.allSettled(bookingIds.map((id) => dispatchUnit(id, b.serials[0], b.warehouse, today())));
		const won = results.filter((r) => r.status === 'fulfilled');
		const lost = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
		expect(won).toHaveLength(1);
		expect(lost).toHaveLength(19);
		const winner = bookingIds[results.findIndex((r) => r.status === 'fulfilled')];
		const winnerQuote = (await Booking.findByPk(winner))!.quoteId;
		for (const l of lost) {
			expect(l.reason).toBeInstanceOf(DomainError);
			expect(l.reason.message).toContain(`is out on booking Q-${String(winnerQuote).padStart(5, '0')}`);
		}
		expect(await BookingUnit.count({ where: { stockUnitId: b.units[0].id } })).toBe(1);
	}, 60_000);
});

describe('availability counts units out late and in repair as unavailable', () => {
	it('a unit not back after its booking ended, and a unit in repair, are not offered for later dates', async () => {
		const b = await makeBooking({ cabinets: 1, units: 3, startDate: daysFromToday(-5), endDate: daysFromToday(-2) });
		const key = `loudspeaker:${b.stock.loudspeaker.id}` as const;
		expect((await unitsInService())[key]).toBe(3);
		await dispatchUnit(b.booking.id, b.serials[0], b.warehouse, today());
		expect((await unitsInService())[key]).toBe(2);
		expect((await lateUnits(today())).map((u) => u.serial)).toContain(b.serials[0]);
		await StockUnit.update({ status: 'in-repair' }, { where: { serial: b.serials[1] } });
		const inService = await unitsInService();
		expect(inService[key]).toBe(1);
		const later = checkAvailability({ [key]: 2 }, inService, [], daysFromToday(10), daysFromToday(12));
		expect(later.shortfalls).toEqual([{ model: key, needed: 2, available: 1, missing: 1 }]);

		const calendar = await modelCalendar(key, today(), daysFromToday(14), today());
		expect(calendar.weeks[1]).toMatchObject({ inService: 3, out: 1, inRepair: 1, reserved: 0, free: 1 });

		await returnUnit(b.booking.id, b.serials[0], b.warehouse);
		expect((await unitsInService())[key]).toBe(2);
		expect((await lateUnits(today())).map((u) => u.serial)).not.toContain(b.serials[0]);
	});

	it('the calendar marks a conflict and an open quote that would be short', async () => {
		const b = await makeBooking({ cabinets: 2, units: 2, startDate: daysFromToday(21), endDate: daysFromToday(22) });
		const key = `loudspeaker:${b.stock.loudspeaker.id}` as const;
		await StockUnit.update({ status: 'in-repair' }, { where: { serial: b.serials[0] } });
		const calendar = await modelCalendar(key, today(), daysFromToday(35), today());
		const week = calendar.weeks.find((w) => w.bookings.length > 0)!;
		expect(week).toMatchObject({ reserved: 2, inRepair: 1, free: -1, conflict: true });
	});
});
