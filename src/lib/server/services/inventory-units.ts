import type { Transaction } from 'sequelize';
import type { StockUnitRow } from '$lib/inventory/types';
import { stockUnitSchema, type StockUnitInput, type StockUnitPatch } from '$lib/schemas/inventory-units';
import { AmplifierModel, LoudspeakerModel, StockUnit } from '../db/models';
import { DomainError } from './errors';
import { specModelExists, translateDbError, validOrThrow, withTransaction } from './inventory-common';
import { deleteHistory, recordChanges, recordCreation } from './inventory-history';

const DUPLICATE = { field: 'serial', message: 'Another unit already has this serial' };
const FIELDS = ['serial', 'modelType', 'modelId', 'status', 'location', 'lastTestedAt', 'notes'] as const;
const include = [
	{ model: LoudspeakerModel, as: 'loudspeaker', attributes: ['name', 'maker'] },
	{ model: AmplifierModel, as: 'amplifier', attributes: ['name', 'maker'] }
];

function toRow(unit: StockUnit): StockUnitRow {
	const model = unit.loudspeaker ?? unit.amplifier;
	return {
		id: unit.id,
		serial: unit.serial,
		modelType: unit.modelType,
		modelId: (unit.loudspeakerModelId ?? unit.amplifierModelId)!,
		modelName: model ? `${model.maker} ${model.name}` : '',
		status: unit.status,
		location: unit.location,
		lastTestedAt: unit.lastTestedAt,
		notes: unit.notes,
		createdAt: unit.createdAt.toISOString(),
		updatedAt: unit.updatedAt.toISOString()
	};
}

async function find(id: number, transaction?: Transaction): Promise<StockUnit> {
	const found = await StockUnit.findByPk(id, { include, transaction });
	if (!found) throw new DomainError(404, 'No such stock unit.');
	return found;
}

/** The two model-id columns from the API's modelType + modelId, checking the model exists. */
async function modelColumns(input: StockUnitInput, transaction: Transaction) {
	if (!(await specModelExists(input.modelType, input.modelId, transaction))) {
		throw new DomainError(422, 'Some fields need attention.', { modelId: [`No such ${input.modelType} model`] });
	}
	return {
		loudspeakerModelId: input.modelType === 'loudspeaker' ? input.modelId : null,
		amplifierModelId: input.modelType === 'amplifier' ? input.modelId : null
	};
}

export async function listStockUnits(): Promise<StockUnitRow[]> {
	const rows = await StockUnit.findAll({ include, order: [['serial', 'ASC']] });
	return rows.map(toRow);
}

export async function getStockUnit(id: number): Promise<StockUnitRow> {
	return toRow(await find(id));
}

export async function createStockUnit(input: StockUnitInput, actorId: number | null, transaction?: Transaction): Promise<StockUnitRow> {
	const values = validOrThrow(stockUnitSchema, input);
	return withTransaction(transaction, async (t) => {
		const { modelId: _m, ...fields } = values;
		const created = await StockUnit.create({ ...fields, ...(await modelColumns(values, t)) }, { transaction: t }).catch((err) =>
			translateDbError(err, DUPLICATE)
		);
		await recordCreation({ modelType: 'unit', modelId: created.id }, values.serial, actorId, t);
		return toRow(await find(created.id, t));
	});
}

export async function updateStockUnit(id: number, changes: StockUnitPatch, actorId: number | null, transaction?: Transaction): Promise<StockUnitRow> {
	return withTransaction(transaction, async (t) => {
		const current = await find(id, t);
		const before = toRow(current);
		const merged = validOrThrow(stockUnitSchema, { ...pickFields(before), ...changes });
		const changed = await recordChanges({ modelType: 'unit', modelId: id }, before, merged, FIELDS, actorId, t);
		if (changed.length === 0) return before;
		const { modelId: _m, ...fields } = merged;
		await current.update({ ...fields, ...(await modelColumns(merged, t)) }, { transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
		return toRow(await find(id, t));
	});
}

export async function deleteStockUnit(id: number, transaction?: Transaction): Promise<void> {
	await withTransaction(transaction, async (t) => {
		const current = await find(id, t);
		await deleteHistory('unit', id, t);
		await current.destroy({ transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
	});
}

function pickFields(row: StockUnitRow): StockUnitInput {
	const { serial, modelType, modelId, status, location, lastTestedAt, notes } = row;
	return { serial, modelType, modelId, status, location, lastTestedAt, notes };
}
