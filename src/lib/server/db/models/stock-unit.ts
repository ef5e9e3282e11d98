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
import { STOCK_UNIT_STATUSES, type StockUnitStatus } from '../../../schemas/inventory-units';
import type { AmplifierModel } from './amplifier-model';
import type { LoudspeakerModel } from './loudspeaker-model';
import type { ModelType } from '../../../inventory/types';

/** One physical cabinet or amplifier with its serial; exactly one of the two model ids is set. */
export class StockUnit extends Model<InferAttributes<StockUnit>, InferCreationAttributes<StockUnit>> {
	declare id: CreationOptional<number>;
	declare serial: string;
	declare modelType: ModelType;
	declare loudspeakerModelId: ForeignKey<LoudspeakerModel['id']> | null;
	declare amplifierModelId: ForeignKey<AmplifierModel['id']> | null;
	declare status: StockUnitStatus;
	declare location: string;
	/** A calendar date (yyyy-mm-dd). */
	declare lastTestedAt: string | null;
	declare notes: string;
	declare loudspeaker?: NonAttribute<LoudspeakerModel | null>;
	declare amplifier?: NonAttribute<AmplifierModel | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		StockUnit.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				serial: { type: DataTypes.STRING(60), allowNull: false, unique: true },
				modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
				loudspeakerModelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				amplifierModelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				status: { type: DataTypes.ENUM(...STOCK_UNIT_STATUSES), allowNull: false },
				location: { type: DataTypes.STRING(120), allowNull: false },
				lastTestedAt: { type: DataTypes.DATEONLY, allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'stock_units' }
		);
	}
}
