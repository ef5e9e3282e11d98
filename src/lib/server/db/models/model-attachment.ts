import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { User } from './user';
import type { ModelType } from '../../../inventory/types';

/** A spec sheet (PDF) or photo of a model; the bytes live in `stored_files` under `storedName`. */
export class ModelAttachment extends Model<InferAttributes<ModelAttachment>, InferCreationAttributes<ModelAttachment>> {
	declare id: CreationOptional<number>;
	declare modelType: ModelType;
	declare modelId: number;
	declare kind: 'spec-sheet' | 'photo';
	declare originalName: string;
	declare storedName: string;
	declare mimeType: string;
	declare sizeBytes: number;
	declare uploadedBy: ForeignKey<User['id']> | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ModelAttachment.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
				modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				kind: { type: DataTypes.ENUM('spec-sheet', 'photo'), allowNull: false },
				originalName: { type: DataTypes.STRING(200), allowNull: false },
				storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
				mimeType: { type: DataTypes.STRING(60), allowNull: false },
				sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				uploadedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'model_attachments', updatedAt: false }
		);
	}
}
