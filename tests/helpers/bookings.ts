/**
 * A confirmed booking made directly in the test database (no quote flow): a client, a quote, the
 * booking and its lines for a fresh fixture package, with its units tested today unless told.
 */
import { randomInt } from 'node:crypto';
import { Booking, BookingLine, Quote, StockUnit } from '../../src/lib/server/db/models';
import { BOOKINGS, CATALOGUE, invalidate } from '../../src/lib/server/cache';
import { createQuote } from '../../src/lib/server/services/quotes';
import type { SessionUser } from '../../src/lib/server/auth/signed-in-user';
import { makeContactUser, makeStaffUser, makeStockedPackage } from './inventory';

export const today = () => new Date().toISOString().slice(0, 10);

export function daysFromToday(days: number): string {
	return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

/** Dates far ahead, spread out, so files running side by side do not share hire days. */
export function farDates(length = 2): { startDate: string; endDate: string } {
	const start = new Date(Date.UTC(2070 + randomInt(0, 25), randomInt(0, 12), randomInt(1, 26)));
	const iso = (d: Date) => d.toISOString().slice(0, 10);
	return { startDate: iso(start), endDate: iso(new Date(start.getTime() + (length - 1) * 86_400_000)) };
}

/** A quote made by the quoting service (so it has its version, as every quote must), then marked confirmed. */
async function confirmedQuote(clientId: number, eventName: string, packageId: number, dates: { startDate: string; endDate: string }, actor: SessionUser) {
	const request = { targetDb: 90, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech', temperatureC: 20, humidityPct: 50, ...dates };
	const made = await createQuote({ clientId, eventName, packageId, request }, actor);
	await Quote.update({ status: 'confirmed' }, { where: { id: made.id } });
	return (await Quote.findByPk(made.id))!;
}

export async function makeBooking(options: { cabinets?: number; units?: number; amplifiers?: number; amplifierUnits?: number; startDate?: string; endDate?: string; tested?: string | null } = {}) {
	const cabinets = options.cabinets ?? 2;
	const amplifiers = options.amplifiers ?? 1;
	const stock = await makeStockedPackage({ cabinets, units: options.units ?? cabinets, amplifierUnits: options.amplifierUnits ?? amplifiers });
	const tested = options.tested === undefined ? today() : options.tested;
	await StockUnit.update({ lastTestedAt: tested }, { where: { loudspeakerModelId: stock.loudspeaker.id } });
	await StockUnit.update({ lastTestedAt: tested }, { where: { amplifierModelId: stock.amplifier.id } });
	const warehouse = await makeStaffUser('admin');
	const { client, user: contactUser } = await makeContactUser();
	const dates = options.startDate && options.endDate ? { startDate: options.startDate, endDate: options.endDate } : farDates();
	const quote = await confirmedQuote(client.id, `Out and back ${stock.tag}`, stock.pkg.id, dates, warehouse);
	const booking = await Booking.create({ quoteId: quote.id, status: 'confirmed', ...dates });
	await BookingLine.bulkCreate([
		{ bookingId: booking.id, modelType: 'loudspeaker', modelId: stock.loudspeaker.id, quantity: cabinets },
		{ bookingId: booking.id, modelType: 'amplifier', modelId: stock.amplifier.id, quantity: amplifiers }
	]);
	invalidate(BOOKINGS);
	invalidate(CATALOGUE);
	const units = await StockUnit.findAll({ where: { loudspeakerModelId: stock.loudspeaker.id }, order: [['serial', 'ASC']] });
	const amps = await StockUnit.findAll({ where: { amplifierModelId: stock.amplifier.id }, order: [['serial', 'ASC']] });
	return { stock, booking, quote, warehouse, client, contactUser, dates, serials: units.map((u) => u.serial), ampSerials: amps.map((u) => u.serial), units, amps };
}

/** Another confirmed booking for the same models (bypassing the reservation check, as a race needs). */
export async function anotherBooking(of: Awaited<ReturnType<typeof makeBooking>>, dates = of.dates, cabinets = 1) {
	const quote = await confirmedQuote(of.client.id, `Second hire ${of.stock.tag}`, of.stock.pkg.id, dates, of.warehouse);
	const booking = await Booking.create({ quoteId: quote.id, status: 'confirmed', ...dates });
	await BookingLine.create({ bookingId: booking.id, modelType: 'loudspeaker', modelId: of.stock.loudspeaker.id, quantity: cabinets });
	return { booking, quote };
}
