import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { ProgrammeBands } from '../../../schemas/programmes';

/** A programme type's spectrum (relative octave-band levels) and crest factor. */
export class ProgrammeProfile extends Model<
	InferAttributes<ProgrammeProfile>,
	InferCreationAttributes<ProgrammeProfile>
> {
	declare id: CreationOptional<number>;
	declare slug: string;
	declare name: string;
	declare description: string;
	declare bands: ProgrammeBands;
	declare crestFactorDb: number;
	/** Seeded shapes are typical approximations, not measurements; the UI says so. */
	declare isTypical: CreationOptional<boolean>;
	declare sortOrder: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ProgrammeProfile.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				slug: { type: DataTypes.STRING(40), allowNull: false, unique: true },
				name: { type: DataTypes.STRING(80), allowNull: false },
				description: { type: DataTypes.TEXT, allowNull: false },
				bands: { type: DataTypes.JSON, allowNull: false },
				crestFactorDb: { type: DataTypes.DOUBLE, allowNull: false },
				isTypical: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
				sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'programme_profiles' }
		);
	}
}
