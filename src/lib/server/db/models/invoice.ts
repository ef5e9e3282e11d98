import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** Our record of a Stripe invoice for a quote's deposit or balance; amounts in minor units. */
export class Invoice extends Model<InferAttributes<Invoice>, InferCreationAttributes<Invoice>> {
	declare id: CreationOptional<number>;
	declare quoteId: number;
	declare kind: 'deposit' | 'balance';
	declare stripeInvoiceId: string;
	declare number: string | null;
	declare status: 'open' | 'paid' | 'void';
	declare amountMinor: number;
	declare taxMinor: number;
	declare currency: string;
	declare hostedUrl: string | null;
	declare paymentIntentId: CreationOptional<string | null>;
	declare refundedMinor: CreationOptional<number>;
	declare lastPaymentError: CreationOptional<string | null>;
	declare paidAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Invoice.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				kind: { type: DataTypes.ENUM('deposit', 'balance'), allowNull: false },
				stripeInvoiceId: { type: DataTypes.STRING(64), allowNull: false, unique: true },
				number: { type: DataTypes.STRING(64), allowNull: true },
				status: { type: DataTypes.ENUM('open', 'paid', 'void'), allowNull: false },
				amountMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				taxMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				currency: { type: DataTypes.CHAR(3), allowNull: false },
				hostedUrl: { type: DataTypes.STRING(500), allowNull: true },
				paymentIntentId: { type: DataTypes.STRING(64), allowNull: true },
				refundedMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
				lastPaymentError: { type: DataTypes.STRING(500), allowNull: true },
				paidAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'invoices' }
		);
	}
}

export class WebhookEvent extends Model<InferAttributes<WebhookEvent>, InferCreationAttributes<WebhookEvent>> {
	declare id: string;
	declare type: string;
	declare outcome: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		WebhookEvent.init(
			{
				id: { type: DataTypes.STRING(80), primaryKey: true },
				type: { type: DataTypes.STRING(80), allowNull: false },
				outcome: { type: DataTypes.STRING(200), allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'webhook_events' }
		);
	}
}
