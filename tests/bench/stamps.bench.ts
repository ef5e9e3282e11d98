/**
 * What the change stamps cost each request: every signed-in request first reads all stamps
 * (cache-stamps.ts). Measured as sequential round trips against the same database, as a ratio to
 * `SELECT 1` (what GET /api/health asks the database) in the same run.
 */
import { QueryTypes } from 'sequelize';
import { createSequelize, databaseConfigFrom } from '../../src/lib/server/db/connection';
import { syncStamps } from '../../src/lib/server/cache-stamps';
import type { Row } from './report';

const ROUNDS = 2000;

/** Both in alternating blocks, so a busy moment of the machine falls on both alike. */
async function perCallMs(a: () => Promise<unknown>, b: () => Promise<unknown>): Promise<[number, number]> {
	for (let i = 0; i < 100; i++) await Promise.all([a(), b()]); // warm the pool and the server's caches
	const spent = [0, 0];
	for (let block = 0; block < 10; block++) {
		for (const [index, work] of [a, b].entries()) {
			const started = performance.now();
			for (let i = 0; i < ROUNDS / 10; i++) await work();
			spent[index] += performance.now() - started;
		}
	}
	return [spent[0] / ROUNDS, spent[1] / ROUNDS];
}

export async function measureStamps(env: NodeJS.ProcessEnv): Promise<Row> {
	const db = createSequelize(databaseConfigFrom(env)); // binds the models syncStamps reads through
	try {
		const [baseline, stamps] = await perCallMs(
			() => db.query('SELECT 1', { type: QueryTypes.SELECT }),
			() => syncStamps()
		);
		return {
			metric: `change stamps read once per request (${ROUNDS} sequential)`,
			value: stamps,
			unit: 'ms',
			baseline,
			ratio: stamps / baseline
		};
	} finally {
		await db.close();
	}
}
