import { Op, type Transaction } from 'sequelize';
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

/** Tries to hand one queued message to the SMTP server; records the outcome either way. */
export async function deliver(email: OutboundEmail): Promise<boolean> {
	try {
		await mailTransport().sendMail({
			from: mailFrom(),
			to: email.toAddress,
			subject: email.subject,
			text: email.textBody,
			html: email.htmlBody ?? undefined,
			attachments: (email.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, 'base64') }))
		});
		await email.update({ status: 'sent', attempts: email.attempts + 1, sentAt: new Date(), lastError: null });
		return true;
	} catch (err) {
		await email.update({
			status: 'failed',
			attempts: email.attempts + 1,
			lastError: String((err as Error).message).slice(0, 500)
		});
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
 * not answer, nothing is tried, so an outage never uses up a message's attempts.
 */
export async function retryQueuedEmails(limit = 20): Promise<{ sent: number; failed: number; serverDown: boolean }> {
	const waiting = await OutboundEmail.findAll({
		where: {
			attempts: { [Op.lt]: MAX_ATTEMPTS },
			[Op.or]: [
				{ status: 'failed' },
				{ status: 'pending', createdAt: { [Op.lt]: new Date(Date.now() - PENDING_GRACE_MS) } }
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
