import { ForeignKeyConstraintError, UniqueConstraintError, type Model, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { AmplifierModel, LoudspeakerModel } from '../db/models';
import { bumpStamp } from '../cache-stamps';
import { DomainError, fieldErrors } from './errors';
import type { ModelType } from '$lib/inventory/types';

/**
 * Runs `work` in the caller's transaction, or in a new one when the caller has none. Every inventory
 * write passes here, so this is where the catalogue's change stamp is bumped (every process drops
 * its cached catalogue on its next request).
 */
export async function withTransaction<T>(transaction: Transaction | undefined, work: (t: Transaction) => Promise<T>): Promise<T> {
	const run = async (t: Transaction) => {
		const result = await work(t);
		await bumpStamp('catalogue', t); // last, after the write's own locks
		return result;
	};
	if (transaction) return run(transaction);
	return LoudspeakerModel.sequelize!.transaction(run);
}

/** A model instance as a plain object with dates as ISO strings, safe to return from `load` and the API. */
export function plainRow<T extends object>(instance: Model): T {
	const plain = instance.get({ plain: true }) as Record<string, unknown>;
	for (const [key, value] of Object.entries(plain)) {
		if (value instanceof Date) plain[key] = value.toISOString();
	}
	return plain as T;
}

/** Validates a complete record with the shared schema; field errors become a 422 in the one envelope. */
export function validOrThrow<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
	const result = schema.safeParse(value);
	if (!result.success) throw new DomainError(422, 'Some fields need attention.', fieldErrors(result.error.issues));
	return result.data;
}

/** Maps the database's own refusals to the answers people understand. */
export function translateDbError(err: unknown, duplicate: { field: string; message: string }): never {
	if (err instanceof UniqueConstraintError) {
		throw new DomainError(409, duplicate.message, { [duplicate.field]: [duplicate.message] });
	}
	if (err instanceof ForeignKeyConstraintError) {
		throw new DomainError(409, 'Something else still refers to this record (a package, stock unit or quote).');
	}
	throw err;
}

/** The text a history entry keeps for a value; objects (band response, directivity) as canonical JSON. */
export function historyText(value: unknown): string | null {
	if (value === null || value === undefined) return null;
	if (value instanceof Date) return value.toISOString();
	if (typeof value === 'object') return canonicalJson(value);
	return String(value);
}

/**
 * JSON with object keys in a fixed order (bands by frequency), so a value read back from the database
 * compares equal to the same value sent by a form: JavaScript lists "63" before "31.5" but keeps
 * "31.5" where it was inserted.
 */
export function canonicalJson(value: unknown): string {
	if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
	if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
	const record = value as Record<string, unknown>;
	const keys = Object.keys(record)
		.filter((k) => record[k] !== undefined)
		.sort((a, b) => Number(a) - Number(b) || a.localeCompare(b));
	return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(record[k])}`).join(',')}}`;
}

/** Whether a loudspeaker or amplifier model with this id exists. */
export async function specModelExists(modelType: ModelType, id: number, transaction?: Transaction): Promise<boolean> {
	const found = modelType === 'loudspeaker' ? await LoudspeakerModel.findByPk(id, { transaction }) : await AmplifierModel.findByPk(id, { transaction });
	return found !== null;
}
