import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { PackageGroup } from './package-group';

/** A kit the house hires out: groups of cabinets with their amplifiers and channel plan. */
export class Package extends Model<InferAttributes<Package>, InferCreationAttributes<Package>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare slug: string;
	declare description: string;
	declare active: CreationOptional<boolean>;
	declare groups?: NonAttribute<PackageGroup[]>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Package.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
				description: { type: DataTypes.TEXT, allowNull: false },
				active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'packages' }
		);
	}
}
