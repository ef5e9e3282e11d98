/**
 * Change stamps: a write made by another process (here: the stamp bumped straight in the database,
 * as that process's transaction would) drops this process's cached copy on its next sync.
 */
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../tests/helpers/db';
import { cached } from './cache';
import { bumpStamp, syncStamps } from './cache-stamps';

const sequelize = useTestDatabase();

function countingLoader() {
	let loads = 0;
	return { load: async () => ++loads, loads: () => loads };
}

async function version(name: string): Promise<number> {
	const [row] = await sequelize.query<{ version: number }>('SELECT version FROM cache_stamps WHERE name = :name', {
		type: QueryTypes.SELECT,
		replacements: { name }
	});
	return Number(row?.version ?? 0);
}

describe('cache change stamps', () => {
	it("drops a cached entry when another process bumps its family's stamp", async () => {
		await syncStamps();
		const key = `user:stamp-test-${Date.now()}`;
		const counter = countingLoader();
		await cached(key, counter.load);
		await syncStamps();
		await cached(key, counter.load);
		expect(counter.loads()).toBe(1); // nothing changed: still cached

		await sequelize.query(
			"INSERT INTO cache_stamps (name, version) VALUES ('users', 1) ON DUPLICATE KEY UPDATE version = version + 1",
			{ type: QueryTypes.INSERT }
		);
		await syncStamps();
		await cached(key, counter.load);
		expect(counter.loads()).toBe(2);
	});

	it('bumps only when the writing transaction commits', async () => {
		const before = await version('settings');
		await sequelize
			.transaction(async (transaction) => {
				await bumpStamp('settings', transaction);
				throw new Error('roll back');
			})
			.catch(() => undefined);
		expect(await version('settings')).toBe(before);
		await sequelize.transaction((transaction) => bumpStamp('settings', transaction));
		expect(await version('settings')).toBe(before + 1);
	});

	it('requests arriving together share reads, and each waits for a read that began after it', async () => {
		const results = await Promise.all(Array.from({ length: 20 }, () => syncStamps()));
		expect(results).toHaveLength(20);
	});
});
