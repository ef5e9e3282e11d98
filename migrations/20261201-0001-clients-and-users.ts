import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};

export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('clients', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		name: { type: DataTypes.STRING(160), allowNull: false },
		contactName: { type: DataTypes.STRING(120), allowNull: false },
		email: { type: DataTypes.STRING(254), allowNull: false },
		phone: { type: DataTypes.STRING(40), allowNull: true },
		...timestamps
	});
	await qi.createTable('users', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		passwordHash: { type: DataTypes.STRING(100), allowNull: false },
		role: { type: DataTypes.ENUM('admin', 'warehouse', 'sales', 'client'), allowNull: false },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		clientId: {
			type: DataTypes.INTEGER.UNSIGNED,
			allowNull: true,
			references: { model: 'clients', key: 'id' },
			onDelete: 'RESTRICT'
		},
		lastSignInAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('users');
	await qi.dropTable('clients');
}
