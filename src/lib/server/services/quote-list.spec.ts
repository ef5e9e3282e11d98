/** The quote list as a window: newest first, a limit, a search over event, client and reference. */
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { countQuotes, createQuote, getQuote, listQuotes } from './quotes';

useTestDatabase();

const request = {
	targetDb: 90, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2032-03-10', endDate: '2032-03-11'
};

describe('the quote list', () => {
	it('finds by words of the event or by reference, newest first, within the limit, each row as the desk view sums it up', async () => {
		const { pkg } = await makeStockedPackage();
		const desk = await makeStaffUser();
		const { client, user } = await makeContactUser();
		const tag = randomUUID().slice(0, 8);
		const made = [];
		for (let i = 0; i < 3; i++) made.push(await createQuote({ clientId: client.id, eventName: `Harbour 50%_${tag} ${i}`, packageId: pkg.id, request }, desk));

		const found = await listQuotes(desk, { search: `50%_${tag}` });
		expect(found.map((q) => q.id)).toEqual(made.map((q) => q.id).reverse());
		expect(await countQuotes(desk, `50%_${tag}`)).toBe(3);
		expect(await listQuotes(desk, { search: `50%_${tag}`, limit: 2 })).toHaveLength(2);
		expect(await countQuotes(desk, `5_%_${tag}`)).toBe(0); // % and _ are literal, not wildcards

		const byReference = await listQuotes(desk, { search: made[1].reference });
		expect(byReference.map((q) => q.id)).toContain(made[1].id);

		const { version: _v, request: _r, result: _res, notes: _n, recheckReason: _rr, versions: _vs, emails: _e, sentAt: _s, acceptedAt: _a, invoices: _i, bookingIssue: _b, validUntil: _vu, acceptance: _ac, clientMessage: _cm, respondedAt: _ra, site: _si, system: _sy, ...summary } = await getQuote(made[0].id, desk);
		expect(found.at(-1)).toEqual(summary);

		// A client sees only their organisation's quotes, search or not.
		expect((await listQuotes(user, { search: tag })).map((q) => q.clientId)).toEqual([client.id, client.id, client.id]);
		const stranger = (await makeContactUser()).user;
		expect(await countQuotes(stranger, tag)).toBe(0);
	});
});
