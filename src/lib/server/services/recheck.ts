import { QueryTypes, type Transaction } from 'sequelize';
import { OPEN_STATUSES } from '$lib/quotes/states';
import { Quote } from '../db/models';
import { catalogueChanged } from './catalogue';
import type { ModelType } from '$lib/inventory/types';


/**
 * Called by the inventory services whenever a specification field the acoustic model uses changes.
 * Flags every open quote whose current version's package uses the model, so the desk re-checks it
 * before sending; returns how many were flagged.
 */
export async function flagQuotesForSpecChange(
	modelType: ModelType,
	modelId: number,
	transaction?: Transaction
): Promise<number> {
	catalogueChanged();
	const column = modelType === 'loudspeaker' ? 'loudspeakerModelId' : 'amplifierModelId';
	const rows = await Quote.sequelize!.query<{ id: number }>(
		`SELECT DISTINCT q.id FROM quotes q
		   JOIN quote_versions v ON v.quoteId = q.id AND v.version = q.currentVersion
		   JOIN package_groups g ON g.packageId = v.packageId
		  WHERE q.status IN (:open) AND g.${column} = :modelId`,
		{ type: QueryTypes.SELECT, replacements: { open: OPEN_STATUSES, modelId }, transaction }
	);
	if (rows.length === 0) return 0;
	const [count] = await Quote.update(
		{
			needsRecheck: true,
			recheckReason: `A ${modelType} specification used by this quote changed on ${new Date().toISOString().slice(0, 10)}.`
		},
		{ where: { id: rows.map((r) => r.id) }, transaction }
	);
	return count;
}

/**
 * Called when a package's groups change in a way the acoustic model reads (cabinets, amplifiers, wiring,
 * height, spacing, the group's own pattern): flags every open quote whose current version uses the package.
 */
export async function flagQuotesForPackageChange(packageId: number, transaction?: Transaction): Promise<number> {
	catalogueChanged();
	const rows = await Quote.sequelize!.query<{ id: number }>(
		`SELECT DISTINCT q.id FROM quotes q
		   JOIN quote_versions v ON v.quoteId = q.id AND v.version = q.currentVersion
		  WHERE q.status IN (:open) AND v.packageId = :packageId`,
		{ type: QueryTypes.SELECT, replacements: { open: OPEN_STATUSES, packageId }, transaction }
	);
	if (rows.length === 0) return 0;
	const [count] = await Quote.update(
		{
			needsRecheck: true,
			recheckReason: `The package used by this quote changed on ${new Date().toISOString().slice(0, 10)}.`
		},
		{ where: { id: rows.map((r) => r.id) }, transaction }
	);
	return count;
}
