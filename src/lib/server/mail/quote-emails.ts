import { formatMoney } from '$lib/quotes/pricing';
import { boundarySentence, CLIENT_CAUTIONS, headroomSentence, levelPromise, limitsSentence, moneyLines, receiverLines, siteSentence } from '$lib/quotes/plain-language';
import { OUTCOME_WORDS } from '$lib/quotes/outcome';
import type { QuoteDetail } from '$lib/quotes/types';
import type { EmailMessage } from './outbox';
import { publicOrigin } from './transport';

const escapeHtml = (s: string) =>
	s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** The quote e-mail: a plain-language summary and a sign-in link that lands on the quote. */
export function quoteSentEmail(quote: QuoteDetail, to: string, companyName: string, signInToken: string): EmailMessage {
	const link = `${publicOrigin()}/signin?redirectTo=${encodeURIComponent(`/quotes/${quote.id}`)}`;
	const oneTime = `${publicOrigin()}/signin/link/${signInToken}`;
	const boundary = boundarySentence(quote.result, quote.request);
	const site = siteSentence(quote.site);
	const limits = limitsSentence(quote.result, quote.request);
	const receivers = receiverLines(quote.result);
	const paragraphs = [
		`Here is our quote ${quote.reference} for ${quote.eventName}, ${quote.startDate} to ${quote.endDate}.`,
		`We propose "${quote.packageName}" to give ${levelPromise(quote.request)}. ${headroomSentence(quote.result)}`,
		`Assessment: ${OUTCOME_WORDS[quote.outcome]}.`,
		...(boundary ? [boundary] : []),
		...(site ? [site] : []),
		...(limits ? [limits] : []),
		...(receivers.length ? [receivers.join('\n')] : []),
		moneyLines(quote.result).map((l) => `${l.label}: ${l.value}`).join('\n'),
		`Read the full quote, accept it and pay the deposit here (this link signs you in once, for 14 days):\n${oneTime}`,
		`Or sign in with your password:\n${link}`,
		CLIENT_CAUTIONS.join('\n')
	];
	const html = `<div style="font-family:system-ui,sans-serif;color:#1b2a33;max-width:36rem">${paragraphs
		.map((p) => `<p>${escapeHtml(p).replace(/\n/g, '<br>')}</p>`)
		.join('')}<p><a href="${escapeHtml(oneTime)}" style="color:#1f5c63">Open quote ${quote.reference}</a></p></div>`;
	return {
		to,
		subject: `Quote ${quote.reference} for ${quote.eventName} — ${formatMoney(quote.totalMinor, quote.currency)} from ${companyName}`,
		text: `${paragraphs.join('\n\n')}\n\n${companyName}`,
		html,
		quoteId: quote.id
	};
}
