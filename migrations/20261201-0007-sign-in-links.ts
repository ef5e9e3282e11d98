import { DataTypes, type QueryInterface } from 'sequelize';

/** One-time sign-in links e-mailed with a quote; only a hash of each token is stored. */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('sign_in_links', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
		tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
		redirectTo: { type: DataTypes.STRING(500), allowNull: false },
		expiresAt: { type: DataTypes.DATE, allowNull: false },
		usedAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('sign_in_links');
}
