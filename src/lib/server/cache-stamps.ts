/**
 * Keeps the in-process cache (cache.ts) right when several app processes share one database. Each
 * cached family has a change stamp in `cache_stamps`; a write bumps it in the same transaction, and
 * every request first reads all stamps (one primary-key scan of a few rows) and drops the families
 * whose stamp moved. So a deactivation, a role change or a price change acts on the next request on
 * every process, not after the cache's time-to-live.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { BOOKINGS, CATALOGUE, invalidate } from './cache';
import { User } from './db/models';

/** Stamp name → the key prefix of the entries it covers. */
export const STAMPED = {
	catalogue: CATALOGUE,
	bookings: BOOKINGS,
	settings: 'settings',
	programmes: 'programmes',
	users: 'user:'
} as const;
export type StampName = keyof typeof STAMPED;

const seen = new Map<string, number>();

function sequelizeOf(transaction?: Transaction): Sequelize {
	return (transaction as unknown as { sequelize?: Sequelize } | undefined)?.sequelize ?? User.sequelize!;
}

/**
 * Marks a family changed. Call it as the last statement of the writing transaction: the stamp's row
 * lock is then held only for the commit, and always taken after the write's own locks (no deadlock).
 * Without a transaction the write has committed already. This process drops its copy on commit.
 */
export async function bumpStamp(name: StampName, transaction?: Transaction): Promise<void> {
	await sequelizeOf(transaction).query(
		'INSERT INTO cache_stamps (name, version) VALUES (:name, 1) ON DUPLICATE KEY UPDATE version = version + 1',
		{ type: QueryTypes.INSERT, replacements: { name }, transaction }
	);
	if (transaction) transaction.afterCommit(() => invalidate(STAMPED[name]));
	else invalidate(STAMPED[name]);
}

async function readStamps(): Promise<void> {
	const rows = await sequelizeOf().query<{ name: string; version: number | string }>(
		'SELECT name, version FROM cache_stamps',
		{ type: QueryTypes.SELECT }
	);
	const current = new Map(rows.map((row) => [row.name, Number(row.version)]));
	// A family without a row yet is at version 0.
	for (const [name, prefix] of Object.entries(STAMPED)) {
		const version = current.get(name) ?? 0;
		if (seen.get(name) !== version) {
			invalidate(prefix);
			seen.set(name, version);
		}
	}
}

let running: Promise<void> | null = null;
let next: Promise<void> | null = null;

/**
 * Brings the cache up to date with every other process's writes. Requests arriving together share
 * one read, but never one that started before they arrived (it could miss a write they must see):
 * they wait for the read that starts when the running one ends.
 */
export function syncStamps(): Promise<void> {
	if (!running) {
		running = readStamps().finally(() => (running = null));
		return running;
	}
	next ??= running
		.catch(() => undefined)
		.then(() => {
			next = null;
			return syncStamps();
		});
	return next;
}
