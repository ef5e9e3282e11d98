import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type NonAttribute,
	type Sequelize
} from 'sequelize';
import type { DirectivityTable } from '../../../schemas/directivity';
import type { AmplifierModel } from './amplifier-model';
import type { LoudspeakerModel } from './loudspeaker-model';
import type { Package } from './package';

/** One group of a package, exactly the acoustic model's GroupSpec (by model ids), in package order. */
export class PackageGroup extends Model<InferAttributes<PackageGroup>, InferCreationAttributes<PackageGroup>> {
	declare id: CreationOptional<number>;
	declare packageId: ForeignKey<Package['id']>;
	declare position: number;
	declare loudspeakerModelId: ForeignKey<LoudspeakerModel['id']>;
	declare count: number;
	declare stacks: CreationOptional<number>;
	declare amplifierModelId: ForeignKey<AmplifierModel['id']>;
	declare cabinetsPerChannel: number;
	declare flown: CreationOptional<boolean>;
	/** v2: acoustic centre above ground, m; null = the model's default. */
	declare heightM: CreationOptional<number | null>;
	/** v2: between the outermost stacks or hangs, m; null = 0. */
	declare spacingM: CreationOptional<number | null>;
	/** v2: the arrangement's own pattern (JSON), overriding the loudspeaker's. */
	declare directivity: CreationOptional<DirectivityTable | null>;
	declare loudspeaker?: NonAttribute<LoudspeakerModel>;
	declare amplifier?: NonAttribute<AmplifierModel>;

	static initModel(sequelize: Sequelize) {
		PackageGroup.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				packageId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				loudspeakerModelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				stacks: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
				amplifierModelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				cabinetsPerChannel: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				flown: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
				heightM: { type: DataTypes.DOUBLE, allowNull: true },
				spacingM: { type: DataTypes.DOUBLE, allowNull: true },
				directivity: { type: DataTypes.JSON, allowNull: true }
			},
			{ sequelize, tableName: 'package_groups', timestamps: false }
		);
	}
}
