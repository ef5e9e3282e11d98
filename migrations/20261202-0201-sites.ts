import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Sites the company works at again and again, their receivers (neighbours with limits), and the
 * snapshot of the site a quote version was evaluated with (no foreign key: deleting a site must not
 * touch a quote).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('sites', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		name: { type: DataTypes.STRING(120), allowNull: false },
		address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
		notes: { type: DataTypes.TEXT, allowNull: false },
		ground: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'mixed' },
		groundFactor: { type: DataTypes.DOUBLE, allowNull: true },
		aimDeg: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
		positionHeightM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1.5 },
		allowanceDb: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
		units: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'm' },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('sites', ['name']);
	await qi.createTable('site_receivers', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'sites', key: 'id' }, onDelete: 'CASCADE' },
		sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
		name: { type: DataTypes.STRING(80), allowNull: false },
		x: { type: DataTypes.DOUBLE, allowNull: false },
		y: { type: DataTypes.DOUBLE, allowNull: false },
		heightM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1.5 },
		limitDb: { type: DataTypes.DOUBLE, allowNull: false },
		weighting: { type: DataTypes.CHAR(1), allowNull: false, defaultValue: 'A' },
		bandHz: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
		period: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
		notes: { type: DataTypes.TEXT, allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addColumn('quote_versions', 'siteId', { type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
	await qi.addColumn('quote_versions', 'site', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeColumn('quote_versions', 'site');
	await qi.removeColumn('quote_versions', 'siteId');
	await qi.dropTable('site_receivers');
	await qi.dropTable('sites');
}
