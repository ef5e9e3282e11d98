import { describe, expect, it } from 'vitest';
import { inlineSiteSchema } from '$lib/schemas/sites';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { BOOKINGS, invalidate } from '../cache';
import { Booking, BookingLine } from '../db/models';
import { applyQuoteAction } from './quote-actions';
import { createQuote, getQuote } from './quotes';
import { reserveStockForQuote, reservationTransaction } from './bookings';

useTestDatabase();

const request = {
	targetDb: 85, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-09-10', endDate: '2031-09-11'
};

async function composedQuote() {
	const desk = await makeStaffUser();
	const { client } = await makeContactUser();
	const { loudspeaker, amplifier, pkg } = await makeStockedPackage({ cabinets: 2, units: 2 });
	const system = { groups: [{ loudspeakerModelId: loudspeaker.id, count: 1, stacks: 2 as const, amplifierModelId: amplifier.id, cabinetsPerChannel: 1 }] };
	const quote = await createQuote({ clientId: client.id, eventName: 'Composed system fixture', system, request }, desk);
	return { desk, quote, loudspeaker, pkg };
}

describe('a quote with a composed system', () => {
	it('is saved with its groups and priced from its own lines, with no package', async () => {
		const { quote, loudspeaker } = await composedQuote();
		expect(quote.result.billOfMaterials.loudspeakers).toEqual([expect.objectContaining({ modelId: loudspeaker.id, count: 2 })]);
		expect(quote.result.packageName).toBe(`2 × 1 × ${loudspeaker.name}`);
		expect(quote.result.price.totalMinor).toBeGreaterThan(0);
	});

	it('books its lines like a package, and is refused at acceptance once its units were booked meanwhile', async () => {
		const { desk, quote, loudspeaker, pkg } = await composedQuote();
		await applyQuoteAction(quote.id, 'send', desk);
		const other = await createQuote({ clientId: quote.clientId, eventName: 'Other hire', packageId: pkg.id, request }, desk);
		const booking = await Booking.create({ quoteId: other.id, status: 'confirmed', startDate: request.startDate, endDate: request.endDate });
		await BookingLine.create({ bookingId: booking.id, modelType: 'loudspeaker', modelId: loudspeaker.id, quantity: 1 });
		invalidate(BOOKINGS);

		await expect(applyQuoteAction(quote.id, 'accept', desk)).rejects.toMatchObject({
			status: 409,
			message: expect.stringContaining(`${loudspeaker.name}: 1 short`)
		});
		expect((await getQuote(quote.id, desk)).status).toBe('sent');
		const reservation = await reservationTransaction((t) => reserveStockForQuote(quote.id, 1, t));
		expect(reservation.ok).toBe(false);

		await booking.update({ status: 'cancelled' });
		invalidate(BOOKINGS);
		const booked = await reservationTransaction((t) => reserveStockForQuote(quote.id, 1, t));
		expect(booked.ok).toBe(true);
		const lines = await BookingLine.findAll({ where: { bookingId: (booked as { bookingId: number }).bookingId } });
		expect(lines.find((l) => l.modelType === 'loudspeaker')?.quantity).toBe(2);
	});

	it('keeps a group pattern the search offered: the neighbour behind allows a higher level at the position than with the plain group', async () => {
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const { loudspeaker, amplifier } = await makeStockedPackage({ cabinets: 2, units: 2 });
		const bands = ['63', '125', '250', '500', '1000', '2000', '4000', '8000'];
		const rearRejecting = { anglesDeg: [0, 90, 180], bandsDb: Object.fromEntries(bands.map((b) => [b, [0, 6, 20]])) };
		const site = inlineSiteSchema.parse({ name: 'Fixture field', receivers: [{ name: 'Behind', x: 0, y: -120, limitDb: 90, weighting: 'C' }] });
		const group = { loudspeakerModelId: loudspeaker.id, count: 2, stacks: 1 as const, amplifierModelId: amplifier.id, cabinetsPerChannel: 1 };
		const behindOf = async (system: { groups: (typeof group & { directivity?: typeof rearRejecting })[] }) => {
			const quote = await createQuote({ clientId: client.id, eventName: 'Group pattern fixture', system, request: { ...request, site } }, desk);
			return quote.result.limits!.maxTargetDb!;
		};
		const plain = await behindOf({ groups: [group] });
		const patterned = await behindOf({ groups: [{ ...group, directivity: rearRejecting }] });
		expect(patterned).toBeGreaterThan(plain + 10);
	});

	it('refuses models that are not in the inventory with a field error', async () => {
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const system = { groups: [{ loudspeakerModelId: 999999, count: 1, stacks: 1 as const, amplifierModelId: 999999, cabinetsPerChannel: 1 }] };
		await expect(createQuote({ clientId: client.id, eventName: 'Nothing', system, request }, desk)).rejects.toMatchObject({
			status: 422,
			errors: { 'system.groups.0.loudspeakerModelId': expect.any(Array) }
		});
	});

	it('two reservations racing for the last units of a composed system: one books, the other is refused, then a clear 409 at acceptance', async () => {
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const { loudspeaker, amplifier } = await makeStockedPackage({ cabinets: 2, units: 2, amplifierUnits: 2 });
		const system = { groups: [{ loudspeakerModelId: loudspeaker.id, count: 1, stacks: 2, amplifierModelId: amplifier.id, cabinetsPerChannel: 1 }] };
		const raced = { ...request, startDate: '2031-10-04', endDate: '2031-10-05' };
		const quotes = [];
		for (const name of ['Race A', 'Race B']) {
			const q = await createQuote({ clientId: client.id, eventName: name, system, request: raced }, desk);
			await applyQuoteAction(q.id, 'send', desk);
			quotes.push(q);
		}
		const outcomes = await Promise.all(quotes.map((q) => reservationTransaction((t) => reserveStockForQuote(q.id, 1, t))));
		expect(outcomes.filter((o) => o.ok)).toHaveLength(1);
		const refused = outcomes.find((o) => !o.ok) as Extract<(typeof outcomes)[number], { ok: false }>;
		expect(refused.shortfalls).toEqual([expect.objectContaining({ name: loudspeaker.name, missing: 2 })]);
		const reserved = await BookingLine.sum('quantity', { where: { modelType: 'loudspeaker', modelId: loudspeaker.id } });
		expect(reserved).toBe(2);

		invalidate(BOOKINGS);
		const loser = quotes[outcomes.findIndex((o) => !o.ok)];
		await expect(applyQuoteAction(loser.id, 'accept', desk)).rejects.toMatchObject({
			status: 409,
			message: expect.stringContaining(`${loudspeaker.name}: 2 short`)
		});
	});
});
