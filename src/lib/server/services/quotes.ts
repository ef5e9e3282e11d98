/** Saving and reading quotes. A quote keeps every version; each version snapshots what was priced. */
import { QueryTypes, type Transaction } from 'sequelize';
import type { PackageResult } from '$lib/quotes/evaluate-packages';
import { outcomeOf } from '$lib/quotes/outcome';
import type { Outcome } from '$lib/acoustics';
import type { SiteSnapshot } from '$lib/schemas/sites';
import { isEditable, type ClientResponse, type QuoteStatus } from '$lib/quotes/states';
import type { QuoteCreateInput, QuoteReviseInput } from '$lib/schemas/quotes';
import type { QuoteRequestInput } from '$lib/schemas/evaluation';
import { quoteReference } from '$lib/quotes/reference';
import { MAX_CHARGE_MINOR, chargeTooLarge } from '$lib/quotes/hire-limits';
import { formatMoney } from '$lib/quotes/pricing';
import { db, Client, OutboundEmail, Quote, QuoteVersion, User } from '../db';
import { STAFF_EMAIL_REFUSED } from '../auth/sign-in-links';
import type { QuoteDetail, QuoteSummary } from '$lib/quotes/types';
import { invoicesFor } from './invoice-rows';
import { ownClientId, type SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { evaluateForDesk } from './evaluations';
import { loadSystem } from './systems';

interface Snapshot {
	result: PackageResult;
	site: SiteSnapshot | null;
}

/**
 * Prices and evaluates one package for the request now, against the site as it is now; the version
 * keeps both. A composed or suggested system is evaluated the same way, from its groups.
 * A refusal to quote is a 422 on packageId.
 */
async function snapshot(request: QuoteRequestInput, offer: Pick<QuoteReviseInput, 'packageId' | 'system'>, quoteId?: number): Promise<Snapshot> {
	const packages = offer.system ? [await loadSystem(offer.system)] : undefined;
	const { results, site } = await evaluateForDesk(request, { packageIds: [offer.packageId ?? 0], packages, excludeQuoteId: quoteId });
	if (results.length === 0) {
		throw new DomainError(422, 'That package is not available for quoting.', { packageId: ['Choose an active package'] });
	}
	if (chargeTooLarge(results[0].price.totalMinor)) {
		const message = `The total is more than the payment service can take in one invoice (${formatMoney(MAX_CHARGE_MINOR, results[0].price.currency)}): shorten the hire or split it into several quotes.`;
		throw new DomainError(422, message, { 'request.endDate': [message] });
	}
	return { result: results[0], site };
}

async function clientFor(input: QuoteCreateInput, transaction: Transaction): Promise<number> {
	if (input.clientId !== undefined) {
		const client = await Client.findByPk(input.clientId, { transaction });
		if (!client) throw new DomainError(422, 'No such client.', { clientId: ['Choose an existing client'] });
		return client.id;
	}
	const { name, contactName, email, phone } = input.newClient!;
	const account = await User.findOne({ where: { email }, attributes: ['role'], transaction });
	if (account && account.role !== 'client') {
		throw new DomainError(422, STAFF_EMAIL_REFUSED, { 'newClient.email': [STAFF_EMAIL_REFUSED] });
	}
	const [client] = await Client.findOrCreate({
		where: { email },
		defaults: { name, contactName, email, phone: phone ?? null },
		transaction
	});
	return client.id;
}

export async function createQuote(input: QuoteCreateInput, actor: SessionUser): Promise<QuoteDetail> {
	const evaluated = await snapshot(input.request, input);
	const quoteId = await db().transaction(async (transaction) => {
		const clientId = await clientFor(input, transaction);
		const quote = await Quote.create({ clientId, eventName: input.eventName, createdById: actor.id }, { transaction });
		await writeVersion(quote.id, 1, input, evaluated, actor, transaction);
		return quote.id;
	});
	return getQuote(quoteId, actor);
}

/** Saves the edited request as a new version; a sent quote goes back to draft until sent again. */
export async function reviseQuote(id: number, input: QuoteReviseInput, actor: SessionUser): Promise<QuoteDetail> {
	const evaluated = await snapshot(input.request, input, id);
	await db().transaction(async (transaction) => {
		const quote = await Quote.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
		if (!quote) throw new DomainError(404, 'No such quote.');
		if (!isEditable(quote.status)) {
			throw new DomainError(409, `A quote that is ${quote.status} can no longer be edited.`);
		}
		const version = quote.currentVersion + 1;
		await writeVersion(id, version, input, evaluated, actor, transaction);
		await quote.update(
			{ currentVersion: version, status: 'draft', eventName: input.eventName, needsRecheck: false, recheckReason: null },
			{ transaction }
		);
	});
	return getQuote(id, actor);
}

async function writeVersion(
	quoteId: number,
	version: number,
	input: QuoteReviseInput,
	{ result, site }: Snapshot,
	actor: SessionUser,
	transaction: Transaction
) {
	await QuoteVersion.create(
		{
			quoteId,
			version,
			packageId: input.packageId ?? null,
			system: input.system ?? null,
			startDate: input.request.startDate,
			endDate: input.request.endDate,
			request: input.request,
			evaluation: result,
			price: result.price,
			siteId: site?.siteId ?? null,
			site,
			notes: input.notes ?? null,
			createdById: actor.id
		},
		{ transaction }
	);
}

/** Clients see only their organisation's quotes; anyone else's is reported as not found. */
function visibleTo(actor: SessionUser): { clientId?: number } {
	if (actor.role !== 'client') return {};
	return { clientId: ownClientId(actor) };
}

function summaryOf(quote: Quote & { client?: Client; versions?: QuoteVersion[] }): QuoteSummary {
	const current = quote.versions!.find((v) => v.version === quote.currentVersion)!;
	return {
		id: quote.id,
		reference: quoteReference(quote.id),
		eventName: quote.eventName,
		status: quote.status,
		clientId: quote.clientId,
		clientName: quote.client?.name ?? '',
		startDate: current.startDate,
		endDate: current.endDate,
		packageName: current.evaluation.packageName,
		verdict: current.evaluation.verdict,
		outcome: outcomeOf(current.evaluation),
		totalMinor: current.price.totalMinor,
		currency: current.price.currency,
		needsRecheck: quote.needsRecheck,
		clientResponse: quote.clientResponse,
		updatedAt: quote.updatedAt.toISOString()
	};
}

/**
 * Every quote the person may see, newest change first. One query over the current versions only,
 * with the few figures the list shows read inside MariaDB: loading every version's whole evaluation
 * to show its package name cost 3.6 s at 5,000 hires.
 */
export async function listQuotes(actor: SessionUser, options: QuoteListOptions = {}): Promise<QuoteSummary[]> {
	const { where, replacements } = listFilter(actor, options.search);
	const rows = await Quote.sequelize!.query<QuoteListRow>(
		`SELECT q.id, q.eventName, q.status, q.clientId, c.name AS clientName, v.startDate, v.endDate,
		        JSON_VALUE(v.evaluation, '$.packageName') AS packageName, JSON_VALUE(v.evaluation, '$.verdict') AS verdict,
		        JSON_VALUE(v.evaluation, '$.outcome') AS outcome, JSON_VALUE(v.evaluation, '$.evaluation.outcome') AS evaluationOutcome,
		        JSON_VALUE(v.evaluation, '$.evaluation.boundary.marginDb') AS boundaryMarginDb,
		        JSON_VALUE(v.price, '$.totalMinor') AS totalMinor, JSON_VALUE(v.price, '$.currency') AS currency,
		        q.needsRecheck, q.clientResponse, q.updatedAt
		   FROM quotes q
		   JOIN clients c ON c.id = q.clientId
		   JOIN quote_versions v ON v.quoteId = q.id AND v.version = q.currentVersion
		  ${where}
		  ORDER BY q.updatedAt DESC, q.id DESC
		  ${options.limit ? 'LIMIT :limit' : ''}`,
		{ type: QueryTypes.SELECT, replacements: { ...replacements, limit: options.limit ?? null } }
	);
	return rows.map((r) => ({
		id: r.id,
		reference: quoteReference(r.id),
		eventName: r.eventName,
		status: r.status,
		clientId: r.clientId,
		clientName: r.clientName,
		startDate: dateOnly(r.startDate),
		endDate: dateOnly(r.endDate),
		packageName: r.packageName ?? '',
		verdict: r.verdict ?? '',
		outcome: outcomeOf({
			verdict: r.verdict ?? '',
			outcome: r.outcome ?? undefined,
			evaluation: {
				outcome: r.evaluationOutcome ?? undefined,
				boundary: r.boundaryMarginDb === null ? null : ({ marginDb: Number(r.boundaryMarginDb) } as never)
			}
		}),
		totalMinor: Number(r.totalMinor),
		currency: r.currency ?? '',
		needsRecheck: Boolean(r.needsRecheck),
		clientResponse: r.clientResponse ?? null,
		updatedAt: new Date(r.updatedAt).toISOString()
	}));
}

export interface QuoteListOptions {
	/** Words in the event, the client's name or the reference (Q-00042). */
	search?: string;
	/** The newest this many; a list page shows a window, never every quote of a busy year. */
	limit?: number;
}

/** How many quotes the person may see (matching the search, if any). */
export async function countQuotes(actor: SessionUser, search?: string): Promise<number> {
	const { where, replacements } = listFilter(actor, search);
	const [row] = await Quote.sequelize!.query<{ n: number | string }>(
		`SELECT COUNT(*) AS n FROM quotes q JOIN clients c ON c.id = q.clientId ${where}`,
		{ type: QueryTypes.SELECT, replacements }
	);
	return Number(row.n);
}

function listFilter(actor: SessionUser, search?: string): { where: string; replacements: Record<string, unknown> } {
	const clientId = visibleTo(actor).clientId;
	const conditions: string[] = [];
	if (clientId !== undefined) conditions.push('q.clientId = :clientId');
	const words = (search ?? '').trim().slice(0, 100);
	const id = /^q-?0*(\d+)$/i.exec(words)?.[1];
	if (words) conditions.push(`(q.eventName LIKE :like OR c.name LIKE :like${id ? ' OR q.id = :id' : ''})`);
	const like = `%${words.replace(/[\\%_]/g, (m) => `\\${m}`)}%`;
	return {
		where: conditions.length ? `WHERE ${conditions.join(' AND ')}` : '',
		replacements: { clientId: clientId ?? null, like, id: id ? Number(id) : null }
	};
}

interface QuoteListRow {
	id: number;
	eventName: string;
	status: QuoteStatus;
	clientId: number;
	clientName: string;
	startDate: string | Date;
	endDate: string | Date;
	packageName: string | null;
	verdict: string | null;
	outcome: Outcome | null;
	evaluationOutcome: Outcome | null;
	boundaryMarginDb: string | number | null;
	totalMinor: string | number;
	currency: string | null;
	needsRecheck: number | boolean;
	clientResponse: ClientResponse | null;
	updatedAt: string | Date;
}

/** A DATE column as YYYY-MM-DD, whether the driver hands back text or a Date at midnight UTC. */
function dateOnly(value: string | Date): string {
	return value instanceof Date ? value.toISOString().slice(0, 10) : String(value).slice(0, 10);
}

export async function getQuote(id: number, actor: SessionUser): Promise<QuoteDetail> {
	const quote = await Quote.findOne({
		where: { id, ...visibleTo(actor) },
		include: [
			{ model: Client, as: 'client', attributes: ['name'] },
			{ model: QuoteVersion, as: 'versions' }
		],
		order: [[{ model: QuoteVersion, as: 'versions' }, 'version', 'DESC']]
	});
	if (!quote) throw new DomainError(404, 'No such quote.');
	const versions = (quote as Quote & { versions: QuoteVersion[] }).versions;
	const current = versions.find((v) => v.version === quote.currentVersion)!;
	const emails = actor.role === 'client' ? [] : await OutboundEmail.findAll({ where: { quoteId: id }, order: [['id', 'DESC']] });
	return {
		...summaryOf(quote),
		version: current.version,
		request: current.request,
		result: current.evaluation,
		site: current.site ?? null,
		system: current.system ?? null,
		notes: current.notes,
		recheckReason: quote.recheckReason,
		versions: versions.map((v) => ({
			version: v.version,
			createdAt: v.createdAt.toISOString(),
			packageName: v.evaluation.packageName,
			totalMinor: v.price.totalMinor
		})),
		emails: emails.map((e) => ({
			id: e.id,
			toAddress: e.toAddress,
			subject: e.subject,
			status: e.status,
			createdAt: e.createdAt.toISOString(),
			lastError: e.lastError
		})),
		sentAt: quote.sentAt?.toISOString() ?? null,
		acceptedAt: quote.acceptedAt?.toISOString() ?? null,
		invoices: await invoicesFor(id),
		bookingIssue: actor.role === 'client' ? null : quote.bookingIssue,
		validUntil: quote.validUntil,
		acceptance: await acceptanceOf(quote),
		clientMessage: quote.clientMessage,
		respondedAt: quote.respondedAt?.toISOString() ?? null
	};
}

async function acceptanceOf(quote: Quote): Promise<QuoteDetail['acceptance']> {
	if (!quote.acceptedAt || !quote.acceptedById) return null;
	const by = await User.findByPk(quote.acceptedById, { attributes: ['name'] });
	return { byName: by?.name ?? 'someone', at: quote.acceptedAt.toISOString(), terms: (quote.acceptedTerms ?? '').split('\n').filter(Boolean) };
}
