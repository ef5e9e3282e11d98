/**
 * The SMTP server down while the desk sends a quote: the quote is sent anyway, the answer says the
 * e-mail did not leave, it waits in the outbox, and the retry timer delivers it, once, when the
 * server is back. The world runs the timer every second (MAIL_RETRY_MS=1000).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { listMail, waitForMail } from '../fakes/mailbox';
import { api, eventually, SALES, signIn, within } from './http';
import { CLIENT_FESTIVAL, deskView, draftQuote } from './quotes';
import { startMailSink, stopMailSink } from './services';
import { world } from './world-info';

// Longer than five retry passes: an outage must not use up the message's five attempts.
const OUTAGE_MS = 6500;

afterAll(async () => {
	await startMailSink(); // leave the world whole even if a step failed
});

describe('the mail server is down when a quote is sent', () => {
	it('sends the quote, queues the e-mail, and delivers it once the server is back', async () => {
		const eventName = `Riverside dawn chorus ${Date.now()}`;
		const sales = await signIn(SALES);
		const id = await draftQuote(sales, {
			clientEmail: CLIENT_FESTIVAL,
			eventName,
			date: '2034-04-11'
		});
		const since = new Date();

		await stopMailSink();
		const outageStarted = performance.now();
		const sent = await api(`/api/quotes/${id}/actions`, {
			cookie: sales,
			method: 'POST',
			body: { action: 'send' },
			timeoutMs: 10_000
		});
		expect(sent.status, sent.text).toBe(200);
		expect(sent.json.mailSent).toBe(false);
		expect(sent.json.quote.status).toBe('sent');
		expect(sent.ms).toBeLessThan(5000);

		const queued = await deskView(id);
		expect(queued.status).toBe('sent');
		const email = queued.emails.find((e) => e.subject.includes(eventName));
		expect(email, 'the quote e-mail is in the outbox').toBeDefined();
		expect(['failed', 'pending']).toContain(email!.status);

		// Keep the server down through several retry passes before bringing it back.
		await new Promise((r) =>
			setTimeout(r, Math.max(0, OUTAGE_MS - (performance.now() - outageStarted)))
		);
		expect((await deskView(id)).emails.find((e) => e.id === email!.id)?.status).not.toBe('sent');
		await startMailSink();
		const backAt = performance.now();

		const { mailApi } = world();
		const mail = await within(
			'the queued e-mail',
			12_000,
			waitForMail({
				to: CLIENT_FESTIVAL,
				subjectIncludes: eventName,
				since,
				timeoutMs: 10_000,
				baseUrl: mailApi
			})
		);
		const deliveredMs = Math.round(performance.now() - backAt);
		expect(mail.text).toContain(eventName);
		await eventually(
			'the outbox row marked sent',
			async () =>
				(await deskView(id)).emails.find((e) => e.id === email!.id)?.status === 'sent'
					? true
					: undefined,
			5000
		);

		// Exactly one copy, even after a few more retry passes.
		await new Promise((r) => setTimeout(r, 2500));
		const copies = (
			await within('the sink inbox', 5000, listMail({ to: CLIENT_FESTIVAL, baseUrl: mailApi }))
		).filter((m) => m.subject.includes(eventName));
		expect(copies).toHaveLength(1);
		console.log(
			`[faults] smtp down: send answered in ${sent.ms} ms (mailSent false); delivered ${deliveredMs} ms after the sink came back`
		);
	});
});
