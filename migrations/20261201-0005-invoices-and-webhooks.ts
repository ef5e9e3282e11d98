import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.addColumn('clients', 'stripeCustomerId', { type: DataTypes.STRING(64), allowNull: true });
	// Set when a paid deposit could not be turned into a booking (stock gone): the desk must act.
	await qi.addColumn('quotes', 'bookingIssue', { type: DataTypes.STRING(500), allowNull: true });

	await qi.createTable('invoices', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'quotes', key: 'id' }, onDelete: 'RESTRICT' },
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
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('invoices', ['quoteId', 'kind']);

	// Every webhook event applied, by Stripe's event id: a replay finds its row and changes nothing.
	await qi.createTable('webhook_events', {
		id: { type: DataTypes.STRING(80), primaryKey: true },
		type: { type: DataTypes.STRING(80), allowNull: false },
		outcome: { type: DataTypes.STRING(200), allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('webhook_events');
	await qi.dropTable('invoices');
	await qi.removeColumn('quotes', 'bookingIssue');
	await qi.removeColumn('clients', 'stripeCustomerId');
}
