import { randomUUID } from 'node:crypto';
import { afterAll } from 'vitest';
import { createSequelize, databaseConfigFrom } from '../../src/lib/server/db/connection';

/**
 * Binds the models to the test database that scripts/test.sh migrated, and closes the pool after
 * the file. Each test file makes its own rows with unique names, so files can run side by side.
 */
export function useTestDatabase() {
	const sequelize = createSequelize(databaseConfigFrom(process.env));
	afterAll(() => sequelize.close());
	return sequelize;
}

/** An e-mail address no other test or seeder uses. */
export function uniqueEmail(label = 'person'): string {
	return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}
