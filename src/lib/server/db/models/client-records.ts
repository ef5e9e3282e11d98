import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { DeskNoticeKind } from '../../../quotes/states';

/** One edited field of a client record: who changed it, when, old → new. */
export class ClientChange extends Model<InferAttributes<ClientChange>, InferCreationAttributes<ClientChange>> {
	declare id: CreationOptional<number>;
	declare clientId: number;
	declare changedById: number;
	declare field: string;
	declare oldValue: string | null;
	declare newValue: string | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ClientChange.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				changedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				field: { type: DataTypes.STRING(40), allowNull: false },
				oldValue: { type: DataTypes.TEXT, allowNull: true },
				newValue: { type: DataTypes.TEXT, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'client_changes', updatedAt: false }
		);
	}
}

/** Something a client did that the desk must hear about (also e-mailed to the sales desk). */
export class DeskNotice extends Model<InferAttributes<DeskNotice>, InferCreationAttributes<DeskNotice>> {
	declare id: CreationOptional<number>;
	declare quoteId: number;
	declare kind: DeskNoticeKind;
	declare message: string | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		DeskNotice.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				kind: { type: DataTypes.ENUM('accepted', 'declined', 'change-requested', 'paid'), allowNull: false },
				message: { type: DataTypes.TEXT, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'desk_notices', updatedAt: false }
		);
	}
}

/** A one-time password-reset link; only a hash of its token is stored. */
export class PasswordReset extends Model<InferAttributes<PasswordReset>, InferCreationAttributes<PasswordReset>> {
	declare id: CreationOptional<number>;
	declare userId: number;
	declare tokenHash: string;
	declare expiresAt: Date;
	declare usedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		PasswordReset.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
				expiresAt: { type: DataTypes.DATE, allowNull: false },
				usedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'password_resets', updatedAt: false }
		);
	}
}
