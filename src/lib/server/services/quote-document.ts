/** The quote document for one quote: its content (shared with the print view) and its PDF. */
import { quoteDocument, type QuoteDocument } from '$lib/quotes/document';
import { Client } from '../db';
import { renderQuotePdf } from '../documents/quote-pdf';
import type { MailAttachment } from '../mail/outbox';
import type { SessionUser } from '../auth/signed-in-user';
import { readLogo } from './company-logo';
import { termsFor } from './quote-actions';
import type { QuoteDetail } from '$lib/quotes/types';
import { getQuote } from './quotes';
import { getSettings } from './settings';

/** The document as it stands now; `validUntil` overrides the stored day (the send step stamps it). */
export async function documentContentFor(id: number, actor: SessionUser, overrides: { validUntil?: string } = {}): Promise<QuoteDocument> {
	const [quote, settings] = await Promise.all([getQuote(id, actor), getSettings()]);
	const client = await Client.findByPk(quote.clientId);
	const validUntil = overrides.validUntil ?? quote.validUntil;
	const withValidity: QuoteDetail = { ...quote, validUntil };
	const site = (quote as QuoteDetail & { site?: { name?: string | null; address?: string | null } | null }).site ?? null;
	return quoteDocument(
		{
			reference: quote.reference,
			version: quote.version,
			eventName: quote.eventName,
			startDate: quote.startDate,
			endDate: quote.endDate,
			issueDate: overrides.validUntil ? new Date().toISOString().slice(0, 10) : (quote.sentAt ?? new Date().toISOString()).slice(0, 10),
			validUntil,
			request: quote.request,
			result: quote.result,
			notes: quote.notes,
			client: {
				name: quote.clientName,
				contactName: client?.contactName ?? '',
				billingAddress: client?.billingAddress ?? null,
				taxNumber: client?.taxNumber ?? null
			},
			site,
			acceptance: quote.acceptance
		},
		settings,
		termsFor(withValidity, settings),
		[]
	);
}

export async function quotePdf(id: number, actor: SessionUser, overrides: { validUntil?: string } = {}): Promise<{ bytes: Buffer; filename: string }> {
	const [content, logo] = await Promise.all([documentContentFor(id, actor, overrides), readLogo()]);
	const bytes = await renderQuotePdf(content, logo?.bytes ?? null);
	return { bytes, filename: `${content.title.replace(/[^\w.-]+/g, '-')}.pdf` };
}

/** The PDF as an e-mail attachment (sent with the quote). */
export async function quoteDocumentFor(id: number, actor: SessionUser, overrides: { validUntil?: string } = {}): Promise<MailAttachment> {
	const { bytes, filename } = await quotePdf(id, actor, overrides);
	return { filename, contentType: 'application/pdf', content: bytes };
}
