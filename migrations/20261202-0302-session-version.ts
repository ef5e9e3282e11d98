import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Each user's session version, carried in the session cookie and compared on every request:
 * raising it (sign-out, password change, deactivation) ends every session issued before.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.addColumn('users', 'sessionVersion', { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeColumn('users', 'sessionVersion');
}
