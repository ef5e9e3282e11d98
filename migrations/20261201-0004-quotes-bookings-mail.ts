import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};
const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (model: string, allowNull = false) => ({
	type: DataTypes.INTEGER.UNSIGNED,
	allowNull,
	references: { model, key: 'id' },
	onDelete: 'RESTRICT'
});

export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('quotes', {
		id,
		clientId: ref('clients'),
		eventName: { type: DataTypes.STRING(160), allowNull: false },
		status: {
			type: DataTypes.ENUM('draft', 'sent', 'accepted', 'deposit-paid', 'confirmed', 'closed', 'cancelled'),
			allowNull: false,
			defaultValue: 'draft'
		},
		currentVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
		needsRecheck: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
		recheckReason: { type: DataTypes.STRING(500), allowNull: true },
		createdById: ref('users'),
		sentAt: { type: DataTypes.DATE, allowNull: true },
		acceptedAt: { type: DataTypes.DATE, allowNull: true },
		cancelledAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
	await qi.addIndex('quotes', ['clientId']);
	await qi.addIndex('quotes', ['status']);

	await qi.createTable('quote_versions', {
		id,
		quoteId: { ...ref('quotes'), onDelete: 'CASCADE' },
		version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		packageId: ref('packages'),
		startDate: { type: DataTypes.DATEONLY, allowNull: false },
		endDate: { type: DataTypes.DATEONLY, allowNull: false },
		request: { type: DataTypes.JSON, allowNull: false },
		evaluation: { type: DataTypes.JSON, allowNull: false },
		price: { type: DataTypes.JSON, allowNull: false },
		notes: { type: DataTypes.TEXT, allowNull: true },
		createdById: ref('users'),
		...timestamps
	});
	await qi.addIndex('quote_versions', ['quoteId', 'version'], { unique: true });
	await qi.addIndex('quote_versions', ['packageId']);

	await qi.createTable('bookings', {
		id,
		quoteId: { ...ref('quotes'), unique: true },
		status: { type: DataTypes.ENUM('confirmed', 'cancelled'), allowNull: false },
		startDate: { type: DataTypes.DATEONLY, allowNull: false },
		endDate: { type: DataTypes.DATEONLY, allowNull: false },
		...timestamps
	});
	await qi.addIndex('bookings', ['status', 'startDate', 'endDate']);
	await qi.createTable('booking_lines', {
		id,
		bookingId: { ...ref('bookings'), onDelete: 'CASCADE' },
		modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
		modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		quantity: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		...timestamps
	});
	await qi.addIndex('booking_lines', ['modelType', 'modelId']);

	// Every e-mail is written here first, then sent: a dead mail server loses nothing.
	await qi.createTable('outbound_emails', {
		id,
		toAddress: { type: DataTypes.STRING(254), allowNull: false },
		subject: { type: DataTypes.STRING(200), allowNull: false },
		textBody: { type: DataTypes.TEXT, allowNull: false },
		htmlBody: { type: DataTypes.TEXT, allowNull: true },
		status: { type: DataTypes.ENUM('pending', 'sent', 'failed'), allowNull: false, defaultValue: 'pending' },
		attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
		lastError: { type: DataTypes.STRING(500), allowNull: true },
		quoteId: ref('quotes', true),
		sentAt: { type: DataTypes.DATE, allowNull: true },
		...timestamps
	});
	await qi.addIndex('outbound_emails', ['status']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
	for (const table of ['outbound_emails', 'booking_lines', 'bookings', 'quote_versions', 'quotes']) {
		await qi.dropTable(table);
	}
}
