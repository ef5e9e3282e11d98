import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { BOOKINGS, invalidate } from '../cache';
import { Booking, BookingLine, LoudspeakerModel } from '../db/models';
import { applyQuoteAction } from './quote-actions';
import { createQuote, getQuote, listQuotes, reviseQuote } from './quotes';
import { evaluateForDesk } from './evaluations';
import { flagQuotesForSpecChange } from './recheck';

useTestDatabase();

const request = {
	targetDb: 90, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-05-10', endDate: '2031-05-11'
};

async function quoteFor(clientId: number, packageId: number, desk: Awaited<ReturnType<typeof makeStaffUser>>) {
	return createQuote({ clientId, eventName: 'Fixture event', packageId, request }, desk);
}

describe('availability against confirmed bookings', () => {
	it('counts only bookings overlapping the dates, and names the model that is short', async () => {
		const { pkg, loudspeaker } = await makeStockedPackage({ cabinets: 2, units: 3 });
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const other = await quoteFor(client.id, pkg.id, desk);
		const booking = await Booking.create({ quoteId: other.id, status: 'confirmed', startDate: '2031-05-11', endDate: '2031-05-12' });
		await BookingLine.create({ bookingId: booking.id, modelType: 'loudspeaker', modelId: loudspeaker.id, quantity: 2 });
		invalidate(BOOKINGS); // written directly, past the booking service

		const overlapping = await evaluateForDesk(request, { packageIds: [pkg.id] });
		expect(overlapping.results[0].availability).toEqual({
			ok: false,
			shortfalls: [{ modelType: 'loudspeaker', modelId: loudspeaker.id, name: loudspeaker.name, needed: 2, available: 1, missing: 1 }]
		});
		expect(overlapping.results[0].verdict).toBe('short');

		const before = await evaluateForDesk({ ...request, startDate: '2031-05-01', endDate: '2031-05-09' }, { packageIds: [pkg.id] });
		expect(before.results[0].availability.ok).toBe(true);
	});
});

describe('quotes', () => {
	it('saves a snapshot with the price in minor units and versions on revision', async () => {
		const { pkg } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const { client } = await makeContactUser();
		const quote = await quoteFor(client.id, pkg.id, desk);
		expect(quote.status).toBe('draft');
		expect(quote.version).toBe(1);
		// 2 tops at 4000 + 1 amplifier at 5000, 2 days, under whatever rule the settings hold: whole units.
		expect(Number.isInteger(quote.result.price.totalMinor)).toBe(true);
		const revised = await reviseQuote(quote.id, { eventName: 'Renamed', packageId: pkg.id, request: { ...request, targetDb: 85 } }, desk);
		expect(revised.version).toBe(2);
		expect(revised.versions.map((v) => v.version)).toEqual([2, 1]);
		expect(revised.request.targetDb).toBe(85);
	});

	it('keeps clients to their own quotes: another client gets 404, and sees none in the list', async () => {
		const { pkg } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const owner = await makeContactUser();
		const stranger = await makeContactUser();
		const quote = await quoteFor(owner.client.id, pkg.id, desk);
		await expect(getQuote(quote.id, owner.user)).resolves.toMatchObject({ id: quote.id });
		await expect(getQuote(quote.id, stranger.user)).rejects.toMatchObject({ status: 404 });
		expect((await listQuotes(stranger.user)).map((q) => q.id)).not.toContain(quote.id);
		await expect(applyQuoteAction(quote.id, 'accept', stranger.user)).rejects.toMatchObject({ status: 404 });
	});

	it('refuses illegal moves with 409 and roles that may not move with 403', async () => {
		const { pkg } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const owner = await makeContactUser();
		const quote = await quoteFor(owner.client.id, pkg.id, desk);
		await expect(applyQuoteAction(quote.id, 'accept', owner.user)).rejects.toMatchObject({ status: 409 });
		await expect(applyQuoteAction(quote.id, 'send', owner.user)).rejects.toMatchObject({ status: 403 });
		await expect(applyQuoteAction(quote.id, 'pay-deposit', desk)).rejects.toMatchObject({ status: 403 });
		await expect(applyQuoteAction(quote.id, 'close', desk)).rejects.toMatchObject({ status: 409 });
	});

	it('flags an open quote for re-check when a spec it used changes, and refuses to send it until revised', async () => {
		const { pkg, loudspeaker } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const owner = await makeContactUser();
		const quote = await quoteFor(owner.client.id, pkg.id, desk);
		expect(await flagQuotesForSpecChange('loudspeaker', loudspeaker.id)).toBe(1);
		expect((await getQuote(quote.id, desk)).needsRecheck).toBe(true);
		await expect(applyQuoteAction(quote.id, 'send', desk)).rejects.toMatchObject({ status: 409 });
		await LoudspeakerModel.update({ sensitivityDb: 101 }, { where: { id: loudspeaker.id } });
		const revised = await reviseQuote(quote.id, { eventName: 'Fixture event', packageId: pkg.id, request }, desk);
		expect(revised.needsRecheck).toBe(false);
	});
});
