import { randomBytes } from 'node:crypto';
import { hostname } from 'node:os';
import { literal, Op, type Transaction } from 'sequelize';
import { OutboundEmail } from '../db/models';
import { mailFrom, mailTransport } from './transport';

export interface EmailMessage {
	to: string;
	subject: string;
	text: string;
	html?: string;
	quoteId?: number | null;
	/** Files sent with the message (e.g. the quote document); kept in the outbox so a retry sends them too. */
	attachments?: MailAttachment[];
}

export interface MailAttachment {
	filename: string;
	contentType: string;
	content: Buffer;
}

const MAX_ATTEMPTS = 5;

/** Writes the message to the outbox (inside the caller's transaction when given). */
export async function queueEmail(message: EmailMessage, transaction?: Transaction): Promise<OutboundEmail> {
	return OutboundEmail.create(
		{
			toAddress: message.to,
			subject: message.subject.slice(0, 200),
			textBody: message.text,
			htmlBody: message.html ?? null,
			quoteId: message.quoteId ?? null,
			attachments: message.attachments?.length
				? message.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, contentBase64: a.content.toString('base64') }))
				: null
		},
		{ transaction }
	);
}

/** Names this process in the rows it claims (host, pid and a random tag, in case pids repeat). */
const PROCESS_TAG = `${hostname()}:${process.pid}:${randomBytes(4).toString('hex')}`.slice(0, 100);

/** A claim older than this belongs to a process that died mid-send (SMTP gives up after ~11 s). */
export const STALE_CLAIM_MS = 120_000;

/**
 * Claims one row for this process with a single conditional UPDATE: of several processes trying at
 * once, exactly one sees a changed row. Unsent rows and stale claims can be claimed.
 */
async function claim(id: number): Promise<boolean> {
	const [changed] = await OutboundEmail.update(
		{ status: 'sending', claimedAt: new Date(), claimedBy: PROCESS_TAG },
		{
			where: {
				id,
				attempts: { [Op.lt]: MAX_ATTEMPTS },
				[Op.or]: [
					{ status: { [Op.in]: ['pending', 'failed'] } },
					{ status: 'sending', claimedAt: { [Op.lt]: new Date(Date.now() - STALE_CLAIM_MS) } }
				]
			}
		}
	);
	return changed === 1;
}

/**
 * Claims one queued message, hands it to the SMTP server and records the outcome. Answers false
 * when the message did not leave, including when another process holds it or it was sent already.
 */
export async function deliver(email: OutboundEmail): Promise<boolean> {
	if (!(await claim(email.id))) return false;
	const mine = { where: { id: email.id, claimedBy: PROCESS_TAG } };
	try {
		await mailTransport().sendMail({
			from: mailFrom(),
			to: email.toAddress,
			subject: email.subject,
			text: email.textBody,
			html: email.htmlBody ?? undefined,
			attachments: (email.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, 'base64') }))
		});
		await OutboundEmail.update(
			{ status: 'sent', attempts: literal('attempts + 1'), sentAt: new Date(), lastError: null, claimedAt: null },
			mine
		);
		return true;
	} catch (err) {
		await OutboundEmail.update(
			{
				status: 'failed',
				attempts: literal('attempts + 1'),
				lastError: String((err as Error).message).slice(0, 500),
				claimedAt: null
			},
			mine
		);
		return false;
	}
}

/** Queue, then send at once; a failure leaves it queued for `retryQueuedEmails`. */
export async function sendEmail(message: EmailMessage): Promise<{ sent: boolean; emailId: number }> {
	const email = await queueEmail(message);
	return { sent: await deliver(email), emailId: email.id };
}

/** A fresh message is delivered by its sender right after its transaction commits; a retry pass
 * leaves `pending` rows younger than this alone so it never sends the same message twice. */
const PENDING_GRACE_MS = 60_000;

/**
 * Sends whatever is still waiting (called by the timer in `retry.ts`). While the SMTP server does
 * not answer, nothing is tried, so an outage never uses up a message's attempts. Each row is
 * claimed before it is sent, so timers in several processes never send one message twice.
 */
export async function retryQueuedEmails(limit = 20): Promise<{ sent: number; failed: number; serverDown: boolean }> {
	const waiting = await OutboundEmail.findAll({
		where: {
			attempts: { [Op.lt]: MAX_ATTEMPTS },
			[Op.or]: [
				{ status: 'failed' },
				{ status: 'pending', createdAt: { [Op.lt]: new Date(Date.now() - PENDING_GRACE_MS) } },
				{ status: 'sending', claimedAt: { [Op.lt]: new Date(Date.now() - STALE_CLAIM_MS) } }
			]
		},
		order: [['id', 'ASC']],
		limit
	});
	if (waiting.length === 0) return { sent: 0, failed: 0, serverDown: false };
	try {
		await mailTransport().verify();
	} catch {
		return { sent: 0, failed: waiting.length, serverDown: true };
	}
	let sent = 0;
	for (const email of waiting) if (await deliver(email)) sent++;
	return { sent, failed: waiting.length - sent, serverDown: false };
}
