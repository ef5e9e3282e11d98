/**
 * Migrations and seeding run under a MariaDB named lock: a second process starting at the same time
 * waits for the first, then finds nothing left to do.
 */
import { describe, expect, it } from 'vitest';
import { migrate, underMigrationLock } from '../../scripts/migrate';
import { useTestDatabase } from '../helpers/db';

const first = useTestDatabase();
const second = useTestDatabase();

describe('migration lock', () => {
	it('a second migrator waits while the first holds the lock, then runs', async () => {
		let release: () => void = () => undefined;
		let held: () => void = () => undefined;
		const holding = new Promise<void>((resolve) => (held = resolve));
		const firstRun = underMigrationLock(first, async () => {
			held();
			await new Promise<void>((resolve) => (release = resolve));
		});
		await holding;

		let secondDone = false;
		const secondRun = migrate(second, 'status').then((pending) => {
			secondDone = true;
			return pending;
		});
		await new Promise((r) => setTimeout(r, 700));
		expect(secondDone).toBe(false);

		release();
		await firstRun;
		expect(await secondRun).toEqual([]); // the test world is migrated: nothing pending
	});

	it('two seeders starting together both succeed and seed nothing twice', async () => {
		const [a, b] = await Promise.all([migrate(first, 'seed'), migrate(second, 'seed')]);
		expect([...a, ...b]).toEqual([]);
	});
});
