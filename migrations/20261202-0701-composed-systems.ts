import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Custom systems: a quote version may carry a system composed for it (or suggested from stock)
 * instead of one of the house's packages. Its groups are kept on the version; packageId is null then.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	// MODIFY keeps the foreign key to packages; only NOT NULL goes.
	await qi.sequelize.query('ALTER TABLE quote_versions MODIFY packageId INT UNSIGNED NULL');
	await qi.addColumn('quote_versions', 'system', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeColumn('quote_versions', 'system');
	await qi.sequelize.query('DELETE FROM quote_versions WHERE packageId IS NULL');
	await qi.sequelize.query('ALTER TABLE quote_versions MODIFY packageId INT UNSIGNED NOT NULL');
}
