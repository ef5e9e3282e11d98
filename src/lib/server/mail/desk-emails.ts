import { DESK_NOTICE_LABELS, type DeskNoticeKind } from '$lib/quotes/states';
import type { EmailMessage } from './outbox';
import { publicOrigin } from './transport';

export interface NoticeSubject {
	quoteId: number;
	reference: string;
	eventName: string;
	clientName: string;
}

/** Tells the sales desk what a client did; the link lands on the quote (staff sign in with their password). */
export function deskNoticeEmail(to: string, q: NoticeSubject, kind: DeskNoticeKind, message: string | null, company: string): EmailMessage {
	const link = `${publicOrigin()}/signin?redirectTo=${encodeURIComponent(`/quotes/${q.quoteId}`)}`;
	const what = DESK_NOTICE_LABELS[kind];
	const lines = [
		`${q.clientName} ${what}: ${q.reference} ${q.eventName}.`,
		...(message ? [`Their message:\n${message}`] : []),
		kind === 'declined' || kind === 'change-requested' ? 'The quote is back in your list as a draft to revise or cancel.' : '',
		`Open the quote: ${link}`,
		company
	].filter(Boolean);
	return { to, subject: `${q.clientName} ${what}: ${q.reference} ${q.eventName}`, text: lines.join('\n\n'), quoteId: q.quoteId };
}
