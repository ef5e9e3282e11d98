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
import type { HistoryModelType } from '../../../inventory/types';
import type { User } from './user';

/** One changed field of an inventory record: who, when, old → new (values as text). */
export class HistoryEntry extends Model<InferAttributes<HistoryEntry>, InferCreationAttributes<HistoryEntry>> {
	declare id: CreationOptional<number>;
	declare modelType: HistoryModelType;
	declare modelId: number;
	declare field: string;
	declare oldValue: string | null;
	declare newValue: string | null;
	/** Null for changes made by a script (the demo seeder), not a person. */
	declare userId: ForeignKey<User['id']> | null;
	declare user?: NonAttribute<User | null>;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		HistoryEntry.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier', 'package', 'unit'), allowNull: false },
				modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				field: { type: DataTypes.STRING(60), allowNull: false },
				oldValue: { type: DataTypes.TEXT, allowNull: true },
				newValue: { type: DataTypes.TEXT, allowNull: true },
				userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'history_entries', updatedAt: false }
		);
	}
}
