import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { Weighting } from '../../../acoustics/types';
import type { Ground } from '../../../schemas/sites';

/** A place the company works at again and again; positions are metres from the system. */
export class Site extends Model<InferAttributes<Site, { omit: 'receivers' }>, InferCreationAttributes<Site, { omit: 'receivers' }>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare address: CreationOptional<string>;
	declare notes: string;
	declare ground: Ground;
	declare groundFactor: number | null;
	declare aimDeg: number;
	declare positionHeightM: number;
	declare allowanceDb: number;
	declare units: 'm' | 'ft';
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;
	declare receivers?: NonAttribute<SiteReceiver[]>;

	static initModel(sequelize: Sequelize) {
		Site.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
				notes: { type: DataTypes.TEXT, allowNull: false },
				ground: { type: DataTypes.STRING(10), allowNull: false },
				groundFactor: { type: DataTypes.DOUBLE, allowNull: true },
				aimDeg: { type: DataTypes.DOUBLE, allowNull: false },
				positionHeightM: { type: DataTypes.DOUBLE, allowNull: false },
				allowanceDb: { type: DataTypes.DOUBLE, allowNull: false },
				units: { type: DataTypes.STRING(2), allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'sites' }
		);
	}
}

/** A neighbour's point with its own limit (weighted, or on the 63/125 Hz band). */
export class SiteReceiver extends Model<InferAttributes<SiteReceiver>, InferCreationAttributes<SiteReceiver>> {
	declare id: CreationOptional<number>;
	declare siteId: number;
	declare sortOrder: number;
	declare name: string;
	declare x: number;
	declare y: number;
	declare heightM: number;
	declare limitDb: number;
	declare weighting: Weighting;
	declare bandHz: 63 | 125 | null;
	declare period: string;
	declare notes: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		SiteReceiver.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				sortOrder: { type: DataTypes.INTEGER, allowNull: false },
				name: { type: DataTypes.STRING(80), allowNull: false },
				x: { type: DataTypes.DOUBLE, allowNull: false },
				y: { type: DataTypes.DOUBLE, allowNull: false },
				heightM: { type: DataTypes.DOUBLE, allowNull: false },
				limitDb: { type: DataTypes.DOUBLE, allowNull: false },
				weighting: { type: DataTypes.CHAR(1), allowNull: false },
				bandHz: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
				period: { type: DataTypes.STRING(60), allowNull: false },
				notes: { type: DataTypes.TEXT, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'site_receivers' }
		);
	}
}

export function initSiteModels(sequelize: Sequelize): void {
	Site.initModel(sequelize);
	SiteReceiver.initModel(sequelize);
	Site.hasMany(SiteReceiver, { foreignKey: 'siteId', as: 'receivers', onDelete: 'CASCADE' });
	SiteReceiver.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
}
