import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Counters behind sign-in throttling (rate-limiter-flexible's store layout: key, points, expiry in
 * epoch milliseconds), in MariaDB so every app process sees the same failures.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('sign_in_throttle', {
		key: { type: DataTypes.STRING(255), allowNull: false, primaryKey: true },
		points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		expire: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true }
	});
	await qi.addIndex('sign_in_throttle', ['expire']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('sign_in_throttle');
}
