import { Op, type Transaction } from 'sequelize';
import { OutboundEmail } from '../db/models';
import { mailFrom, mailTransport } from './transport';

export interface EmailMessage {
	to: string;
	subject: string;
	text: string;
	html?: string;
	quoteId?: number | null;
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
			quoteId: message.quoteId ?? null
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
			html: email.htmlBody ?? undefined
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

/** Sends whatever is still waiting (called on a timer and after each successful send). */
export async function retryQueuedEmails(limit = 20): Promise<{ sent: number; failed: number }> {
	const waiting = await OutboundEmail.findAll({
		where: { status: { [Op.in]: ['pending', 'failed'] }, attempts: { [Op.lt]: MAX_ATTEMPTS } },
		order: [['id', 'ASC']],
		limit
	});
	let sent = 0;
	for (const email of waiting) if (await deliver(email)) sent++;
	return { sent, failed: waiting.length - sent };
}
