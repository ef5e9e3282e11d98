/** What the quote pages show: a quote in a list, a quote in full, and its invoices. */
import type { Outcome } from '$lib/acoustics';
import type { SiteSnapshot } from '$lib/schemas/sites';
import type { SystemInput } from '$lib/schemas/systems';
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import type { PackageResult } from './evaluate-packages';
import type { ClientResponse, QuoteStatus } from './states';

export interface QuoteSummary {
	id: number;
	reference: string;
	eventName: string;
	status: QuoteStatus;
	clientId: number;
	clientName: string;
	startDate: string;
	endDate: string;
	packageName: string;
	verdict: string;
	/** Clear, tight, over the limit or short: what every list and badge shows. */
	outcome: Outcome;
	totalMinor: number;
	currency: string;
	needsRecheck: boolean;
	/** The client's answer that handed the quote back to the desk (declined or asked for a change). */
	clientResponse: ClientResponse | null;
	updatedAt: string;
}

export interface QuoteDetail extends QuoteSummary {
	version: number;
	request: QuoteRequestInput;
	result: PackageResult;
	/** The copy of the site this version was evaluated with; null without a site. */
	site: SiteSnapshot | null;
	/** The composed or suggested system this version offers; null when it offers a package. */
	system: SystemInput | null;
	notes: string | null;
	recheckReason: string | null;
	versions: { version: number; createdAt: string; packageName: string; totalMinor: number }[];
	emails: { id: number; toAddress: string; subject: string; status: string; createdAt: string; lastError: string | null }[];
	sentAt: string | null;
	acceptedAt: string | null;
	invoices: InvoiceRow[];
	/** Set when a paid deposit could not become a booking: the desk must act. */
	bookingIssue: string | null;
	/** The last day it may be accepted (set when sent). */
	validUntil: string | null;
	acceptance: { byName: string; at: string; terms: string[] } | null;
	clientMessage: string | null;
	respondedAt: string | null;
}

export interface InvoiceRow {
	id: number;
	kind: 'deposit' | 'balance';
	number: string | null;
	status: 'open' | 'paid' | 'void';
	amountMinor: number;
	taxMinor: number;
	refundedMinor: number;
	currency: string;
	hostedUrl: string | null;
	lastPaymentError: string | null;
	paidAt: string | null;
}
