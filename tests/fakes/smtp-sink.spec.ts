import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { waitForMail } from './mailbox';
import { startSmtpSink, type SmtpSink } from './smtp-sink';
import type { StoredMessage } from './smtp/mail-store';

let sink: SmtpSink;
let mailDir: string;

function transport() {
	return nodemailer.createTransport({
		host: '127.0.0.1',
		port: sink.smtpPort,
		secure: false,
		ignoreTLS: true
	});
}

beforeAll(async () => {
	mailDir = await mkdtemp(join(tmpdir(), 'smtp-sink-'));
	sink = await startSmtpSink({
		host: '127.0.0.1',
		port: 0,
		httpPort: 0,
		mailDir,
		maxBytes: 200_000
	});
});

afterAll(async () => {
	await sink?.close();
	await rm(mailDir, { recursive: true, force: true });
});

beforeEach(async () => {
	await fetch(`${sink.httpUrl}/messages`, { method: 'DELETE' });
});

describe('SMTP sink', () => {
	it('stores a sent message as .eml with a parsed .json sidecar', async () => {
		await transport().sendMail({
			from: 'Desk <desk@sender.test>',
			to: 'Client <Client@receiver.test>',
			subject: 'Your quote Q-17',
			text: 'Plain body',
			html: '<p>HTML body</p>'
		});

		const files = await readdir(mailDir);
		const eml = files.filter((f) => f.endsWith('.eml'));
		expect(eml).toHaveLength(1);
		expect(eml[0]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}-\d{2}-\d{2}\.\d{3}Z-[0-9a-f]{12}\.eml$/);
		const raw = await readFile(join(mailDir, eml[0]), 'utf8');
		expect(raw).toContain('Subject: Your quote Q-17');

		const sidecar = JSON.parse(
			await readFile(join(mailDir, eml[0].replace(/\.eml$/, '.json')), 'utf8')
		) as StoredMessage;
		expect(sidecar).toMatchObject({
			file: eml[0],
			subject: 'Your quote Q-17',
			to: ['client@receiver.test'],
			envelope: { from: 'desk@sender.test', to: ['client@receiver.test'] }
		});
		expect(sidecar.from).toContain('desk@sender.test');
		expect(sidecar.text.trim()).toBe('Plain body');
		expect(sidecar.html).toContain('<p>HTML body</p>');
	});

	it('lists newest first, filters by recipient, fetches one and clears', async () => {
		const t = transport();
		await t.sendMail({
			from: 'a@sender.test',
			to: 'one@receiver.test',
			subject: 'first',
			text: '1'
		});
		await t.sendMail({
			from: 'a@sender.test',
			to: 'two@receiver.test',
			cc: 'one@receiver.test',
			subject: 'second',
			text: '2'
		});

		const all = (await (await fetch(`${sink.httpUrl}/messages`)).json()) as StoredMessage[];
		expect(all.map((m) => m.subject)).toEqual(['second', 'first']);

		const toTwo = (await (
			await fetch(`${sink.httpUrl}/messages?to=TWO@receiver.test`)
		).json()) as StoredMessage[];
		expect(toTwo.map((m) => m.subject)).toEqual(['second']);

		const one = await fetch(`${sink.httpUrl}/messages/${all[1].id}`);
		expect(one.status).toBe(200);
		expect(((await one.json()) as StoredMessage).subject).toBe('first');
		expect((await fetch(`${sink.httpUrl}/messages/nope`)).status).toBe(404);

		const cleared = await fetch(`${sink.httpUrl}/messages`, { method: 'DELETE' });
		expect(await cleared.json()).toEqual({ deleted: 2 });
		expect(await (await fetch(`${sink.httpUrl}/messages`)).json()).toEqual([]);
		expect(await readdir(mailDir)).toEqual([]);
	});

	it('waitForMail resolves when the message arrives and times out otherwise', async () => {
		const pending = waitForMail({
			to: 'late@receiver.test',
			subjectIncludes: 'deposit',
			baseUrl: sink.httpUrl,
			timeoutMs: 3000
		});
		setTimeout(() => {
			void transport().sendMail({
				from: 'a@sender.test',
				to: 'late@receiver.test',
				subject: 'Deposit received',
				text: 'x'
			});
		}, 200);
		expect((await pending).subject).toBe('Deposit received');

		await expect(
			waitForMail({ to: 'nobody@receiver.test', baseUrl: sink.httpUrl, timeoutMs: 300 })
		).rejects.toThrow(/no mail to nobody@receiver.test/);
	});

	it('accepts a login without checking it and refuses an oversized message', async () => {
		const withLogin = nodemailer.createTransport({
			host: '127.0.0.1',
			port: sink.smtpPort,
			secure: false,
			ignoreTLS: true,
			auth: { user: 'anyone', pass: 'anything' }
		});
		await withLogin.sendMail({
			from: 'a@sender.test',
			to: 'b@receiver.test',
			subject: 'with login',
			text: 'ok'
		});

		await expect(
			transport().sendMail({
				from: 'a@sender.test',
				to: 'b@receiver.test',
				subject: 'big',
				text: 'x'.repeat(300_000)
			})
		).rejects.toThrow();
		const subjects = (
			(await (await fetch(`${sink.httpUrl}/messages`)).json()) as StoredMessage[]
		).map((m) => m.subject);
		expect(subjects).toEqual(['with login']);
	});
});
