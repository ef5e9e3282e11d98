import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

export class SignInLink extends Model<InferAttributes<SignInLink>, InferCreationAttributes<SignInLink>> {
	declare id: CreationOptional<number>;
	declare userId: number;
	declare tokenHash: string;
	declare redirectTo: string;
	declare expiresAt: Date;
	declare usedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		SignInLink.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
				redirectTo: { type: DataTypes.STRING(500), allowNull: false },
				expiresAt: { type: DataTypes.DATE, allowNull: false },
				usedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'sign_in_links' }
		);
	}
}
