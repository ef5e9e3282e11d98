import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * One version number per cached family (catalogue, bookings, settings, programmes, users). A write
 * bumps its family's number in its own transaction; every app process reads the numbers once per
 * request and drops what changed, so an edit made through one process acts on the next request
 * everywhere.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('cache_stamps', {
		name: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
		version: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 }
	});
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('cache_stamps');
}
