import {
	DataTypes,
	Model,
	type CreationOptional,
	type ForeignKey,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { ROLES, type Role } from '../../../permissions';
import type { Client } from './client';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
	declare id: CreationOptional<number>;
	declare email: string;
	declare name: string;
	declare passwordHash: string;
	declare role: Role;
	declare active: CreationOptional<boolean>;
	/** Set for `client` users: the organisation whose quotes and invoices they may see. */
	declare clientId: ForeignKey<Client['id']> | null;
	declare lastSignInAt: CreationOptional<Date | null>;
	/** Null until the person chooses a password (a client account starts with an unusable one). */
	declare passwordSetAt: CreationOptional<Date | null>;
	/** Carried in the session cookie; raising it ends every session issued before (endSessions). */
	declare sessionVersion: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		User.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
				name: { type: DataTypes.STRING(120), allowNull: false },
				passwordHash: { type: DataTypes.STRING(100), allowNull: false },
				role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
				active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
				clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				lastSignInAt: { type: DataTypes.DATE, allowNull: true },
				passwordSetAt: { type: DataTypes.DATE, allowNull: true },
				sessionVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'users' }
		);
	}
}
