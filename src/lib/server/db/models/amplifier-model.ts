import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** An amplifier model: the AmplifierSpec fields (power per channel at 8/4/2 Ω) plus hire and mains data. */
export class AmplifierModel extends Model<InferAttributes<AmplifierModel>, InferCreationAttributes<AmplifierModel>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare maker: string;
	declare channels: number;
	declare powerW8: number | null;
	declare powerW4: number | null;
	declare powerW2: number | null;
	declare minLoadOhm: number;
	declare rackUnits: number;
	declare weightKg: number;
	declare dayRateMinor: number;
	declare replacementValueMinor: number;
	/** Current drawn at 1/8 power, for generator sizing. */
	declare mainsCurrentAmps: number;
	declare notes: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		AmplifierModel.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				maker: { type: DataTypes.STRING(120), allowNull: false },
				channels: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				powerW8: { type: DataTypes.DOUBLE, allowNull: true },
				powerW4: { type: DataTypes.DOUBLE, allowNull: true },
				powerW2: { type: DataTypes.DOUBLE, allowNull: true },
				minLoadOhm: { type: DataTypes.DOUBLE, allowNull: false },
				rackUnits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				weightKg: { type: DataTypes.DOUBLE, allowNull: false },
				dayRateMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				replacementValueMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				mainsCurrentAmps: { type: DataTypes.DOUBLE, allowNull: false },
				notes: { type: DataTypes.TEXT, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'amplifier_models' }
		);
	}
}
