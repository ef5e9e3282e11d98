import type { Transaction } from 'sequelize';
import type { HistoryModelType, HistoryEntryRow } from '$lib/inventory/types';
import { HistoryEntry, User } from '../db/models';
import { historyText } from './inventory-common';

/**
 * Writes one history entry per field whose value differs between `before` and `after`, in the
 * caller's transaction, and returns the names of the changed fields.
 */
export async function recordChanges(
	target: { modelType: HistoryModelType; modelId: number },
	before: object,
	after: object,
	fields: readonly string[],
	userId: number | null,
	transaction: Transaction
): Promise<string[]> {
	const old = before as Record<string, unknown>;
	const now = after as Record<string, unknown>;
	const changed = fields.filter((f) => historyText(old[f]) !== historyText(now[f]));
	if (changed.length === 0) return [];
	await HistoryEntry.bulkCreate(
		changed.map((field) => ({
			...target,
			field,
			oldValue: historyText(old[field]),
			newValue: historyText(now[field]),
			userId
		})),
		{ transaction }
	);
	return changed;
}

/** Notes that a record was created (one entry, so the history starts with who added it). */
export async function recordCreation(
	target: { modelType: HistoryModelType; modelId: number },
	label: string,
	userId: number | null,
	transaction: Transaction
): Promise<void> {
	await HistoryEntry.create({ ...target, field: 'created', oldValue: null, newValue: label, userId }, { transaction });
}

/** Newest first, with the name of the person who made each change. */
export async function listHistory(modelType: HistoryModelType, modelId: number): Promise<HistoryEntryRow[]> {
	const rows = await HistoryEntry.findAll({
		where: { modelType, modelId },
		include: [{ model: User, as: 'user', attributes: ['name'] }],
		order: [
			['createdAt', 'DESC'],
			['id', 'DESC']
		]
	});
	return rows.map((r) => ({
		id: r.id,
		field: r.field,
		oldValue: r.oldValue,
		newValue: r.newValue,
		userId: r.userId,
		userName: r.user?.name ?? null,
		createdAt: r.createdAt.toISOString()
	}));
}

export async function deleteHistory(modelType: HistoryModelType, modelId: number, transaction: Transaction): Promise<void> {
	await HistoryEntry.destroy({ where: { modelType, modelId }, transaction });
}
