import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};

export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('company_settings', {
		id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
		companyName: { type: DataTypes.STRING(160), allowNull: false },
		currency: { type: DataTypes.CHAR(3), allowNull: false },
		taxRateBp: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		depositBp: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		pricingRule: { type: DataTypes.STRING(32), allowNull: false },
		defaultMarginDb: { type: DataTypes.DOUBLE, allowNull: false },
		distanceUnit: { type: DataTypes.ENUM('m', 'ft'), allowNull: false },
		paymentTermsDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		cancellationFullRefundDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		...timestamps
	});
	await qi.createTable('programme_profiles', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		slug: { type: DataTypes.STRING(40), allowNull: false, unique: true },
		name: { type: DataTypes.STRING(80), allowNull: false },
		description: { type: DataTypes.TEXT, allowNull: false },
		bands: { type: DataTypes.JSON, allowNull: false },
		crestFactorDb: { type: DataTypes.DOUBLE, allowNull: false },
		isTypical: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		...timestamps
	});
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('programme_profiles');
	await qi.dropTable('company_settings');
}
