/**
 * Six clients pay deposits at once for the last stock of one package; the payment service's
 * webhooks reach both processes through the proxy. Exactly one hire is booked, the other five
 * are flagged with their payment kept: no double booking across processes.
 */
import { describe, expect, it } from 'vitest';
import { payOnHostedPage, CARD_SUCCEEDS } from '../fakes/stripe/testing';
import { useTestDatabase } from '../helpers/db';
import { makeContactUser, makeStockedPackage } from '../helpers/inventory';
import { BookingLine, Quote } from '../../src/lib/server/db/models';
import { bumpStamp } from '../../src/lib/server/cache-stamps';
import { call, eventually, PROCESS_A, PROCESS_B, PROXY, SALES, signIn } from './cluster';

useTestDatabase();

const DATE = '2035-06-14';
const request = { targetDb: 90, weighting: 'A', distance: 10, distanceUnit: 'm', programme: 'speech', startDate: DATE, endDate: DATE };

describe('booking the last units across processes', () => {
	it('six deposits paid at once for stock that fits one hire: one booking', async () => {
		const { pkg, loudspeaker } = await makeStockedPackage({ cabinets: 2, units: 2, amplifierUnits: 6 });
		await bumpStamp('catalogue'); // written straight to the database: tell the processes
		const { client } = await makeContactUser();
		const sales = await signIn(SALES);
		const clientCookie = await signIn(client.email, 'x-password-123');

		const ids: number[] = [];
		for (let i = 0; i < 6; i++) {
			const base = i % 2 ? PROCESS_A : PROCESS_B;
			const created = await call(base, '/api/quotes', { cookie: sales, method: 'POST', body: { clientId: client.id, eventName: `Cluster race ${i}`, packageId: pkg.id, request } });
			expect(created.status, created.text).toBe(201);
			const sent = await call(base, `/api/quotes/${created.json.id}/actions`, { cookie: sales, method: 'POST', body: { action: 'send' } });
			expect(sent.status, sent.text).toBe(200);
			ids.push(created.json.id);
		}
		const hosted: string[] = [];
		for (const id of ids) {
			const accepted = await call(PROXY, `/api/quotes/${id}/actions`, { cookie: clientCookie, method: 'POST', body: { action: 'accept', acceptTerms: true } });
			expect(accepted.status, accepted.text).toBe(200);
			hosted.push((accepted.json.quote.invoices as { kind: string; hostedUrl: string }[]).find((i) => i.kind === 'deposit')!.hostedUrl);
		}
		const paid = await Promise.all(hosted.map((url) => payOnHostedPage(url, CARD_SUCCEEDS)));
		expect(paid.every((p) => p.status < 400)).toBe(true);

		await eventually('every deposit recorded', async () =>
			(await Quote.count({ where: { id: ids, status: ['confirmed', 'deposit-paid'] } })) === 6 ? true : undefined
		, 30_000);
		expect(await Quote.count({ where: { id: ids, status: 'confirmed' } })).toBe(1);
		const reserved = (await BookingLine.sum('quantity', { where: { modelType: 'loudspeaker', modelId: loudspeaker.id } })) ?? 0;
		expect(reserved).toBe(2);
	}, 90_000);
});
