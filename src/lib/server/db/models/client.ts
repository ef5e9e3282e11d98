import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** An organiser's company or organisation: the party a quote and its invoices are addressed to. */
export class Client extends Model<InferAttributes<Client>, InferCreationAttributes<Client>> {
	declare id: CreationOptional<number>;
	declare name: string;
	declare contactName: string;
	declare email: string;
	declare phone: CreationOptional<string | null>;
	declare billingAddress: CreationOptional<string | null>;
	declare taxNumber: CreationOptional<string | null>;
	declare notes: CreationOptional<string | null>;
	declare stripeCustomerId: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Client.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				name: { type: DataTypes.STRING(160), allowNull: false },
				contactName: { type: DataTypes.STRING(120), allowNull: false },
				email: { type: DataTypes.STRING(254), allowNull: false },
				phone: { type: DataTypes.STRING(40), allowNull: true },
				billingAddress: { type: DataTypes.TEXT, allowNull: true },
				taxNumber: { type: DataTypes.STRING(60), allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: true },
				stripeCustomerId: { type: DataTypes.STRING(64), allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'clients' }
		);
	}
}
