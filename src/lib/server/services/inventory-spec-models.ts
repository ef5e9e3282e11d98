import type { ModelStatic, Model, Transaction } from 'sequelize';
import type { z } from 'zod';
import { ModelAttachment, PackageGroup, StockUnit } from '../db/models';
import { DomainError } from './errors';
import { deleteHistory, recordChanges, recordCreation } from './inventory-history';
import { plainRow, translateDbError, validOrThrow, withTransaction } from './inventory-common';
import { deleteStoredFiles } from '../storage/stored-files';
import { flagQuotesForSpecChange } from './recheck';
import type { ModelType } from '$lib/inventory/types';

interface SpecModelConfig<S extends z.ZodType> {
	modelType: ModelType;
	model: ModelStatic<Model>;
	/** The complete schema with its cross-field rules. */
	schema: S;
	/** Every stored field (history compares these). */
	fields: readonly string[];
	/** Fields the acoustic model reads: a change re-checks open quotes. */
	acousticFields: readonly string[];
}

type Row<S extends z.ZodType> = z.output<S> & { id: number; createdAt: string; updatedAt: string };

const DUPLICATE = { field: 'name', message: 'A model with this name and maker already exists' };

/**
 * The list/get/create/update/delete operations loudspeaker and amplifier models share. Every write
 * runs in one transaction with its history entries and the quote re-check, so none can happen alone.
 */
export function specModelService<S extends z.ZodType>(config: SpecModelConfig<S>) {
	const { modelType, model, schema, fields, acousticFields } = config;
	const foreignKey = `${modelType}ModelId`;

	async function find(id: number, transaction?: Transaction) {
		const found = await model.findByPk(id, { transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
		if (!found) throw new DomainError(404, `No such ${modelType} model.`);
		return found;
	}

	async function list(): Promise<Row<S>[]> {
		const rows = await model.findAll({ order: [['maker', 'ASC'], ['name', 'ASC']] });
		return rows.map((r) => plainRow<Row<S>>(r));
	}

	async function get(id: number): Promise<Row<S>> {
		return plainRow<Row<S>>(await find(id));
	}

	async function findByNameAndMaker(name: string, maker: string, transaction?: Transaction): Promise<Row<S> | null> {
		const found = await model.findOne({ where: { name, maker }, transaction });
		return found ? plainRow<Row<S>>(found) : null;
	}

	async function create(input: z.output<S>, actorId: number | null, transaction?: Transaction): Promise<Row<S>> {
		const values = validOrThrow(schema, input) as Record<string, unknown>;
		return withTransaction(transaction, async (t) => {
			const created = await model.create(values, { transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
			const id = created.get('id') as number;
			await recordCreation({ modelType, modelId: id }, `${values.maker} ${values.name}`, actorId, t);
			return plainRow<Row<S>>(created);
		});
	}

	/** Applies changes, writes one history entry per changed field, flags quotes when acoustics changed. */
	async function update(
		id: number,
		changes: Partial<z.output<S>>,
		actorId: number | null,
		transaction?: Transaction
	): Promise<{ row: Row<S>; changed: string[] }> {
		return withTransaction(transaction, async (t) => {
			const current = await find(id, t);
			const before = plainRow<Record<string, unknown>>(current);
			const merged = validOrThrow(schema, { ...pick(before, fields), ...changes }) as Record<string, unknown>;
			const changed = await recordChanges({ modelType, modelId: id }, before, merged, fields, actorId, t);
			if (changed.length === 0) return { row: before as Row<S>, changed };
			await current.update(pick(merged, changed), { transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
			if (changed.some((f) => acousticFields.includes(f))) await flagQuotesForSpecChange(modelType, id, t);
			return { row: plainRow<Row<S>>(current), changed };
		});
	}

	/** Refuses (409) while a package uses the model or stock units of it exist. */
	async function remove(id: number, transaction?: Transaction): Promise<void> {
		await withTransaction(transaction, async (t) => {
			const current = await find(id, t);
			const [groups, units] = await Promise.all([
				PackageGroup.count({ where: { [foreignKey]: id }, transaction: t }),
				StockUnit.count({ where: { [foreignKey]: id }, transaction: t })
			]);
			if (groups > 0 || units > 0) {
				throw new DomainError(409, `This model is still in use: ${groups} package group(s) and ${units} stock unit(s) refer to it.`);
			}
			const attachments = await ModelAttachment.findAll({ where: { modelType, modelId: id }, transaction: t });
			await ModelAttachment.destroy({ where: { modelType, modelId: id }, transaction: t });
			await deleteStoredFiles(attachments.map((a) => a.storedName), t);
			await deleteHistory(modelType, id, t);
			await current.destroy({ transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
		});
	}

	return { modelType, fields, list, get, findByNameAndMaker, create, update, remove };
}

function pick(source: Record<string, unknown>, keys: readonly string[]): Record<string, unknown> {
	return Object.fromEntries(keys.filter((k) => k in source).map((k) => [k, source[k]]));
}
