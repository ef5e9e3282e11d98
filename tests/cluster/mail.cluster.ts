/**
 * Both processes run the outbox's retry timer (every 500 ms here) over one outbox: every waiting
 * message is sent exactly once, whichever process claims it.
 */
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { listMail } from '../fakes/mailbox';
import { uniqueEmail, useTestDatabase } from '../helpers/db';
import { OutboundEmail } from '../../src/lib/server/db/models';
import { eventually } from './cluster';

useTestDatabase();

describe('one outbox, two retry timers', () => {
	it('sends each of 30 waiting messages exactly once', async () => {
		const to = uniqueEmail('cluster-mail');
		const tag = randomUUID().slice(0, 8);
		const rows = await OutboundEmail.bulkCreate(
			Array.from({ length: 30 }, (_, i) => ({ toAddress: to, subject: `cluster ${tag} #${i}`, textBody: 'Sent once.', status: 'failed' as const }))
		);
		const ids = rows.map((r) => r.id);
		await eventually('all 30 marked sent', async () =>
			(await OutboundEmail.count({ where: { id: ids, status: 'sent' } })) === 30 ? true : undefined
		);
		await new Promise((r) => setTimeout(r, 1500)); // a few more passes of both timers
		const received = (await listMail({ to })).filter((m) => m.subject.includes(tag));
		expect(received).toHaveLength(30);
		expect(new Set(received.map((m) => m.subject)).size).toBe(30);
		const sent = await OutboundEmail.findAll({ where: { id: ids } });
		expect(sent.every((r) => r.attempts === 1)).toBe(true);
		const byProcess = new Map<string, number>();
		for (const r of sent) byProcess.set(r.claimedBy!, (byProcess.get(r.claimedBy!) ?? 0) + 1);
		console.log(`[cluster] 30 messages sent once each; by process: ${[...byProcess.values()].join(' + ')}`);
	});
});
