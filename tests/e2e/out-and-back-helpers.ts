/**
 * A confirmed booking the out-and-back tests own, made through the API as people would: the admin
 * adds models, a package and units (tested today), the desk quotes it, the client accepts and pays
 * the deposit on the payment stand-in, and the webhook confirms the booking.
 */
import { randomInt, randomUUID } from 'node:crypto';
import { api } from './http';
import { amplifierBody, loudspeakerBody } from './inventory-helpers';
import { EMAILS, type Sessions } from './proof/people';
import { act, payDeposit } from './proof/quotes';

function must(result: { status: number; json: any }, want: number, what: string) {
	if (result.status !== want) throw new Error(`${what}: ${result.status} ${JSON.stringify(result.json).slice(0, 300)}`);
	return result.json;
}

export interface OwnBooking {
	bookingId: number;
	quoteId: number;
	speakerId: number;
	ampId: number;
	speakers: { id: number; serial: string }[];
	amps: { id: number; serial: string }[];
}

export async function makeOwnBooking(sessions: Sessions, options: { spareSpeakers?: number } = {}): Promise<OwnBooking> {
	const tag = randomUUID().slice(0, 6).toUpperCase();
	const admin = sessions.admin;
	const speaker = must(await api('/api/loudspeakers', { cookie: admin, method: 'POST', body: loudspeakerBody() }), 201, 'loudspeaker');
	const amp = must(await api('/api/amplifiers', { cookie: admin, method: 'POST', body: amplifierBody() }), 201, 'amplifier');
	const pkg = must(
		await api('/api/packages', {
			cookie: admin,
			method: 'POST',
			body: { name: `Out and back kit ${tag}`, slug: `out-back-${tag.toLowerCase()}`, groups: [{ loudspeakerModelId: speaker.id, amplifierModelId: amp.id, count: 2, stacks: 1, cabinetsPerChannel: 1 }] }
		}),
		201,
		'package'
	);
	const today = new Date().toISOString().slice(0, 10);
	const unit = async (modelType: string, modelId: number, serial: string) =>
		must(await api('/api/stock-units', { cookie: admin, method: 'POST', body: { serial, modelType, modelId, lastTestedAt: today, location: 'Bay 7' } }), 201, `unit ${serial}`);
	const speakers = [];
	for (let i = 1; i <= 2 + (options.spareSpeakers ?? 1); i++) speakers.push(await unit('loudspeaker', speaker.id, `OB-${tag}-${i}`));
	const amps = [await unit('amplifier', amp.id, `OBA-${tag}-1`)];

	const users = must(await api('/api/users', { cookie: admin }), 200, 'users') as { email: string; clientId: number | null }[];
	const clientId = users.find((u) => u.email === EMAILS.client)?.clientId;
	const day = new Date(Date.UTC(2100 + randomInt(0, 30), randomInt(0, 12), randomInt(1, 27))).toISOString().slice(0, 10);
	const request = { targetDb: 80, weighting: 'A', distance: 10, distanceUnit: 'm', programme: 'speech', startDate: day, endDate: day };
	const quote = must(
		await api('/api/quotes', { cookie: sessions.sales, method: 'POST', body: { clientId, eventName: `Out and back ${tag}`, packageId: pkg.id, request } }),
		201,
		'quote'
	);
	await act(sessions.sales, quote.id, 'send');
	await act(sessions.client, quote.id, 'accept');
	await payDeposit(sessions, quote.id);
	const list = must(await api('/api/bookings', { cookie: sessions.warehouse }), 200, 'bookings') as { id: number; quoteId: number }[];
	const booking = list.find((b) => b.quoteId === quote.id);
	if (!booking) throw new Error(`no booking for quote ${quote.id}`);
	const pick = (u: { id: number; serial: string }) => ({ id: u.id, serial: u.serial });
	return { bookingId: booking.id, quoteId: quote.id, speakerId: speaker.id, ampId: amp.id, speakers: speakers.map(pick), amps: amps.map(pick) };
}
