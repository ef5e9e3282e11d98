/**
 * The outbox with several processes: two retry timers running at once (as two app processes do)
 * send every waiting message exactly once, and a claim left by a process that died is taken over.
 * Needs the test world's database and SMTP sink (scripts/test-world.sh services).
 */
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { listMail } from '../../../../tests/fakes/mailbox';
import { uniqueEmail, useTestDatabase } from '../../../../tests/helpers/db';
import { OutboundEmail } from '../db';
import { retryQueuedEmails, STALE_CLAIM_MS } from './outbox';

useTestDatabase();

async function queueFailed(to: string, subject: string, extra: Partial<OutboundEmail> = {}) {
	return OutboundEmail.create({ toAddress: to, subject, textBody: 'Outbox claim test.', status: 'failed', ...extra });
}

describe('outbox claims', () => {
	it('two retry loops at once send each waiting message exactly once', async () => {
		const to = uniqueEmail('claims');
		const tag = randomUUID().slice(0, 8);
		const rows = [];
		for (let i = 0; i < 12; i++) rows.push(await queueFailed(to, `claim ${tag} #${i}`));
		const ids = rows.map((r) => r.id);

		const loop = async () => {
			for (let pass = 0; pass < 10; pass++) {
				await retryQueuedEmails(6);
				const left = await OutboundEmail.count({ where: { id: ids, status: ['failed', 'pending', 'sending'] } });
				if (left === 0) return;
			}
		};
		await Promise.all([loop(), loop()]);

		const stored = await OutboundEmail.findAll({ where: { id: ids } });
		expect(stored.map((r) => r.status)).toEqual(ids.map(() => 'sent'));
		expect(stored.map((r) => r.attempts)).toEqual(ids.map(() => 1));
		const received = (await listMail({ to })).filter((m) => m.subject.includes(tag));
		expect(received).toHaveLength(12);
		expect(new Set(received.map((m) => m.subject)).size).toBe(12);
	});

	it('takes over a claim left by a process that stopped mid-send, but not a fresh one', async () => {
		const to = uniqueEmail('stale');
		const tag = randomUUID().slice(0, 8);
		const stale = await queueFailed(to, `stale ${tag}`, {
			status: 'sending',
			claimedAt: new Date(Date.now() - STALE_CLAIM_MS - 1000),
			claimedBy: 'gone:1:dead'
		});
		const fresh = await queueFailed(to, `fresh ${tag}`, {
			status: 'sending',
			claimedAt: new Date(),
			claimedBy: 'busy:2:live'
		});
		for (let pass = 0; pass < 5 && (await stale.reload()).status !== 'sent'; pass++) await retryQueuedEmails();
		expect(stale.status).toBe('sent');
		expect((await fresh.reload()).status).toBe('sending');
		const received = (await listMail({ to })).filter((m) => m.subject.includes(tag));
		expect(received.map((m) => m.subject)).toEqual([`stale ${tag}`]);
	});
});
