import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { BandResponse, DirectivityTable } from '../../../schemas/directivity';
import { LOUDSPEAKER_KINDS, SENSITIVITY_REFS } from '../../../schemas/inventory-loudspeakers';

type Kind = (typeof LOUDSPEAKER_KINDS)[number];

/** A loudspeaker cabinet model: every field of the acoustic model's LoudspeakerSpec, plus hire data. */
export class LoudspeakerModel extends Model<InferAttributes<LoudspeakerModel>, InferCreationAttributes<LoudspeakerModel>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare maker: string;
	declare kind: Kind;
	declare sensitivityDb: number;
	declare sensitivityRef: '1W' | '2.83V';
	declare impedanceOhm: number;
	declare powerContinuousW: number;
	declare powerPeakW: number | null;
	declare maxSplContinuousDb: number | null;
	declare maxSplPeakDb: number | null;
	declare dispersionHDeg: number;
	declare dispersionVDeg: number;
	declare lowHz: number;
	declare highHz: number;
	declare heightM: number | null;
	/** v2: dB re the sensitivity per octave band (JSON); null = flat. */
	declare bandResponseDb: CreationOptional<BandResponse | null>;
	declare compressionDb: CreationOptional<number | null>;
	/** v2: horizontal directivity table (JSON, bands × angles); null = the model's cautious default. */
	declare directivity: CreationOptional<DirectivityTable | null>;
	declare weightKg: number;
	declare dayRateMinor: number;
	declare replacementValueMinor: number;
	declare notes: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		// DOUBLE, not DECIMAL: the mariadb connector returns DOUBLE as a number, and it holds any JS number exactly.
		// Fresh objects per attribute: Sequelize writes into each definition it is given.
		const measure = () => ({ type: DataTypes.DOUBLE, allowNull: false });
		const optional = () => ({ type: DataTypes.DOUBLE, allowNull: true });
		LoudspeakerModel.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				maker: { type: DataTypes.STRING(120), allowNull: false },
				kind: { type: DataTypes.ENUM(...LOUDSPEAKER_KINDS), allowNull: false },
				sensitivityDb: measure(),
				sensitivityRef: { type: DataTypes.ENUM(...SENSITIVITY_REFS), allowNull: false },
				impedanceOhm: measure(),
				powerContinuousW: measure(),
				powerPeakW: optional(),
				maxSplContinuousDb: optional(),
				maxSplPeakDb: optional(),
				dispersionHDeg: measure(),
				dispersionVDeg: measure(),
				lowHz: measure(),
				highHz: measure(),
				heightM: optional(),
				bandResponseDb: { type: DataTypes.JSON, allowNull: true },
				compressionDb: optional(),
				directivity: { type: DataTypes.JSON, allowNull: true },
				weightKg: measure(),
				dayRateMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				replacementValueMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				notes: { type: DataTypes.TEXT, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'loudspeaker_models' }
		);
	}
}
