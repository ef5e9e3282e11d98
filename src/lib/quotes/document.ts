/**
 * The quote document: what a production manager files. One pure description of its content, drawn
 * by the server as a PDF and by the print view as a page, so both say the same thing.
 */
import type { PackageResult } from './evaluate-packages';
import { outcomeOf } from './outcome';
import { assessmentText, boundarySentence, CLIENT_CAUTIONS, headroomSentence, levelPromise, limitsSentence, moneyLines, receiverLines } from './plain-language';
import { formatMoney } from './pricing';
import { formatDate, formatDateRange, formatDateTime } from '../format/dates';
import type { QuoteRequestInput } from '../schemas/evaluation';

export interface Letterhead {
	companyName: string;
	companyAddress: string | null;
	companyTaxNumber: string | null;
	companyContact: string | null;
}

export interface DocumentSource {
	reference: string;
	version: number;
	eventName: string;
	startDate: string;
	endDate: string;
	issueDate: string;
	validUntil: string | null;
	request: QuoteRequestInput;
	result: PackageResult;
	notes: string | null;
	client: { name: string; contactName: string; billingAddress: string | null; taxNumber: string | null };
	/** A site snapshot, when the quote has one. */
	site?: { name?: string | null; address?: string | null } | null;
	acceptance?: { byName: string; at: string } | null;
}

export interface QuoteDocument {
	letterhead: { name: string; lines: string[] };
	title: string;
	facts: { label: string; value: string }[];
	clientLines: string[];
	promise: string[];
	equipment: { name: string; count: number }[];
	priceLines: { description: string; quantity: number; dayRate: string; amount: string }[];
	totals: { label: string; value: string }[];
	terms: string[];
	cautions: string[];
	notes: string | null;
	acceptance: string | null;
}

const lines = (text: string | null | undefined) => (text ?? '').split(/\r?\n/).map((l) => l.trim()).filter(Boolean);

export function quoteDocument(source: DocumentSource, letterhead: Letterhead, terms: string[], cautions: string[]): QuoteDocument {
	const { result, request } = source;
	const p = result.price;
	const boundary = boundarySentence(result, request);
	const limits = limitsSentence(result, request);
	const siteName = source.site?.name?.trim();
	return {
		letterhead: {
			name: letterhead.companyName,
			lines: [
				...lines(letterhead.companyAddress),
				...(letterhead.companyContact ? [letterhead.companyContact] : []),
				...(letterhead.companyTaxNumber ? [`Tax number ${letterhead.companyTaxNumber}`] : [])
			]
		},
		title: `Quote ${source.reference}`,
		facts: [
			{ label: 'Quote', value: `${source.reference}, version ${source.version}` },
			{ label: 'Issued', value: formatDate(source.issueDate) },
			{ label: 'Valid until', value: source.validUntil ? formatDate(source.validUntil) : 'set when the quote is sent' },
			{ label: 'Event', value: source.eventName },
			{ label: 'Hire', value: `${formatDateRange(source.startDate, source.endDate)} (${p.hireDays} day${p.hireDays === 1 ? '' : 's'})` },
			...(siteName ? [{ label: 'Site', value: [siteName, source.site?.address?.trim()].filter(Boolean).join(', ') }] : [])
		],
		clientLines: [
			source.client.name,
			...(source.client.contactName ? [`For the attention of ${source.client.contactName}`] : []),
			...lines(source.client.billingAddress),
			...(source.client.taxNumber ? [`Tax number ${source.client.taxNumber}`] : [])
		],
		promise: [
			`${result.packageName} to give ${levelPromise(request)}.`,
			headroomSentence(result),
			assessmentText(outcomeOf(result)),
			...(boundary ? [boundary] : []),
			...(limits ? [limits] : []),
			...receiverLines(result)
		],
		equipment: [...result.billOfMaterials.loudspeakers, ...result.billOfMaterials.amplifiers].map((l) => ({ name: l.name, count: l.count })),
		priceLines: p.lines.map((l) => ({
			description: l.description,
			quantity: l.quantity,
			dayRate: formatMoney(l.dayRateMinor, p.currency),
			amount: formatMoney(l.amountMinor, p.currency)
		})),
		totals: moneyLines(result),
		terms,
		cautions: [...CLIENT_CAUTIONS, ...cautions],
		notes: source.notes,
		acceptance: source.acceptance ? `Accepted with these terms by ${source.acceptance.byName} on ${formatDateTime(source.acceptance.at)}.` : null
	};
}
