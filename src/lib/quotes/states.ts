/** The life of a quote, from first draft to a paid, confirmed hire, as one transition table. */
export const QUOTE_STATUSES = [
	'draft',
	'sent',
	'accepted',
	'deposit-paid',
	'confirmed',
	'closed',
	'cancelled'
] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export const QUOTE_ACTIONS = ['send', 'revise', 'accept', 'decline', 'request-change', 'pay-deposit', 'confirm', 'close', 'cancel'] as const;
export type QuoteAction = (typeof QUOTE_ACTIONS)[number];

const TRANSITIONS: Record<QuoteStatus, Partial<Record<QuoteAction, QuoteStatus>>> = {
	draft: { send: 'sent', cancel: 'cancelled' },
	// A decline or a change request hands the quote back to the desk as a draft to revise or cancel.
	sent: { accept: 'accepted', decline: 'draft', 'request-change': 'draft', revise: 'draft', send: 'sent', cancel: 'cancelled' },
	accepted: { 'pay-deposit': 'deposit-paid', cancel: 'cancelled' },
	'deposit-paid': { confirm: 'confirmed', cancel: 'cancelled' },
	confirmed: { close: 'closed', cancel: 'cancelled' },
	closed: {},
	cancelled: {}
};

export const QUOTE_STATUS_LABELS: Record<QuoteStatus, string> = {
	draft: 'Draft',
	sent: 'Sent to client',
	accepted: 'Accepted',
	'deposit-paid': 'Deposit paid',
	confirmed: 'Booking confirmed',
	closed: 'Closed',
	cancelled: 'Cancelled'
};

/** The status after `action`, or null when the action is not allowed from `status`. */
export function nextStatus(status: QuoteStatus, action: QuoteAction): QuoteStatus | null {
	return TRANSITIONS[status][action] ?? null;
}

export function allowedActions(status: QuoteStatus): QuoteAction[] {
	return Object.keys(TRANSITIONS[status]) as QuoteAction[];
}

/** Quotes still in play: a spec change to a model they use flags them for a re-check. */
export const OPEN_STATUSES: readonly QuoteStatus[] = ['draft', 'sent', 'accepted'];

/** Editing is only possible before the client has accepted. */
export function isEditable(status: QuoteStatus): boolean {
	return status === 'draft' || status === 'sent';
}

/** The client's answers that hand a sent quote back to the desk. */
export const CLIENT_RESPONSES = ['declined', 'change-requested'] as const;
export type ClientResponse = (typeof CLIENT_RESPONSES)[number];

/** What the desk is told about (an e-mail to the sales desk and an Overview item). */
export type DeskNoticeKind = 'accepted' | 'declined' | 'change-requested' | 'paid';

export const DESK_NOTICE_LABELS: Record<DeskNoticeKind, string> = {
	accepted: 'accepted the quote',
	declined: 'declined the quote',
	'change-requested': 'asked for a change',
	paid: 'paid the deposit'
};

/** A sent quote may be accepted up to and including its last valid day. */
export function isExpired(validUntil: string | null, today: string): boolean {
	return validUntil !== null && today > validUntil;
}
