/** What the desk is told when a client accepts, declines, asks for a change or pays: an Overview item and an e-mail. */
import type { Transaction } from 'sequelize';
import { quoteReference } from '$lib/quotes/reference';
import type { DeskNoticeKind } from '$lib/quotes/states';
import { Client, DeskNotice, Quote } from '../db';
import { deskNoticeEmail } from '../mail/desk-emails';
import { queueEmail } from '../mail/outbox';

export interface DeskNoticeRow {
	id: number;
	quoteId: number;
	reference: string;
	eventName: string;
	kind: DeskNoticeKind;
	message: string | null;
	at: string;
}

/**
 * Records the notice and queues the e-mail to the sales desk (when its address is set) in the
 * caller's transaction; returns the queued e-mail's id so the caller sends it after commit.
 * `deskEmail` and `company` are read by the caller before its transaction (see DEVELOPERS.md).
 */
export async function noteForDesk(
	quote: Pick<Quote, 'id' | 'eventName' | 'clientId'>,
	kind: DeskNoticeKind,
	message: string | null,
	settings: { salesDeskEmail: string | null; companyName: string },
	transaction: Transaction
): Promise<number | null> {
	await DeskNotice.create({ quoteId: quote.id, kind, message }, { transaction });
	if (!settings.salesDeskEmail) return null;
	const client = await Client.findByPk(quote.clientId, { transaction, attributes: ['name'] });
	const subject = { quoteId: quote.id, reference: quoteReference(quote.id), eventName: quote.eventName, clientName: client?.name ?? 'The client' };
	const email = await queueEmail(deskNoticeEmail(settings.salesDeskEmail, subject, kind, message, settings.companyName), transaction);
	return email.id;
}

export async function recentDeskNotices(limit = 10): Promise<DeskNoticeRow[]> {
	const rows = await DeskNotice.findAll({
		include: [{ model: Quote, as: 'quote', attributes: ['eventName'] }],
		order: [['id', 'DESC']],
		limit
	});
	return rows.map((n) => ({
		id: n.id,
		quoteId: n.quoteId,
		reference: quoteReference(n.quoteId),
		eventName: (n as DeskNotice & { quote?: Quote }).quote?.eventName ?? '',
		kind: n.kind,
		message: n.message,
		at: n.createdAt.toISOString()
	}));
}
