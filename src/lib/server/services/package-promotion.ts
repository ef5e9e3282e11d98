/**
 * Promote: a quote's composed or suggested system saved as a new package with the same groups, so
 * the desk can offer it again. The groups are taken as the quote evaluated them (heights and
 * flown filled in, a suggested group's pattern kept), so the package sounds the same as the system did.
 */
import { Op, QueryTypes } from 'sequelize';
import type { PackageRow } from '$lib/inventory/types';
import { freeSlug, slugFromName } from '$lib/inventory/package-slug';
import { quoteReference } from '$lib/quotes/reference';
import { promoteSchema, type PromoteInput } from '$lib/schemas/systems';
import { Package, Quote, QuoteVersion } from '../db/models';
import { DomainError } from './errors';
import { validOrThrow } from './inventory-common';
import { createPackage } from './inventory-packages';
import { loadSystem } from './systems';

const NAME_TAKEN = 'Another package already has this name';

export async function promoteSystem(quoteId: number, input: PromoteInput, actorId: number): Promise<PackageRow> {
	const { name, description } = validOrThrow(promoteSchema, input);
	const quote = await Quote.findByPk(quoteId, { attributes: ['id', 'currentVersion'] });
	if (!quote) throw new DomainError(404, 'No such quote.');
	const version = await QuoteVersion.findOne({ where: { quoteId, version: quote.currentVersion }, attributes: ['system'] });
	if (!version?.system) throw new DomainError(409, 'This quote offers a package from the inventory, not a composed or suggested system.');
	// The collation compares names without case, so "Big top" and "BIG TOP" count as one name.
	if (await Package.findOne({ where: { name }, attributes: ['id'] })) throw new DomainError(409, NAME_TAKEN, { name: [NAME_TAKEN] });

	const loaded = await loadSystem(version.system);
	const base = slugFromName(name, `system-from-quote-${quoteId}`);
	const taken = await Package.findAll({ where: { slug: { [Op.like]: `${base}%` } }, attributes: ['slug'] });
	const groups = loaded.groups.map((g) => ({
		loudspeakerModelId: g.loudspeakerModelId,
		count: g.count,
		stacks: g.stacks,
		amplifierModelId: g.amplifierModelId,
		cabinetsPerChannel: g.cabinetsPerChannel,
		flown: g.flown,
		heightM: g.heightM ?? null,
		spacingM: g.spacingM ?? null,
		directivity: g.directivity ?? null
	}));
	// Two promotions racing for one name meet at the unique slug: the second is a 409 too.
	return createPackage(
		{ name, slug: freeSlug(base, new Set(taken.map((p) => p.slug))), description: description || `Saved from the system on quote ${quoteReference(quoteId)}`, active: true, groups },
		actorId
	).catch((err) => {
		if (err instanceof DomainError && err.status === 409 && err.errors?.slug) throw new DomainError(409, NAME_TAKEN, { name: [NAME_TAKEN] });
		throw err;
	});
}

export interface SystemOnQuote {
	quoteId: number;
	reference: string;
	systemName: string;
	startDate: string;
	status: string;
}

/**
 * The latest quotes whose current version offers a composed or suggested system: where the
 * warehouse, who does not read quotes, finds systems worth keeping as packages.
 */
export async function systemsOnQuotes(limit = 20): Promise<SystemOnQuote[]> {
	const rows = await Quote.sequelize!.query<{ id: number; name: string | null; startDate: string | Date; status: string }>(
		`SELECT q.id, JSON_VALUE(v.evaluation, '$.packageName') AS name, v.startDate, q.status
		   FROM quotes q
		   JOIN quote_versions v ON v.quoteId = q.id AND v.version = q.currentVersion
		  WHERE v.system IS NOT NULL AND q.status <> 'cancelled'
		  ORDER BY q.updatedAt DESC, q.id DESC
		  LIMIT :limit`,
		{ type: QueryTypes.SELECT, replacements: { limit } }
	);
	return rows.map((r) => ({
		quoteId: r.id,
		reference: quoteReference(r.id),
		systemName: r.name ?? '',
		startDate: r.startDate instanceof Date ? r.startDate.toISOString().slice(0, 10) : String(r.startDate).slice(0, 10),
		status: r.status
	}));
}
