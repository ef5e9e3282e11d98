import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (model: string, onDelete = 'CASCADE', allowNull = false) => ({
	type: DataTypes.INTEGER.UNSIGNED,
	allowNull,
	references: { model, key: 'id' },
	onDelete
});

/**
 * The client's side of the deal: fuller client records with their change history, the quote's
 * validity and the client's answer (acceptance with terms, decline, change request), notices for the
 * desk, password resets, and the letterhead and validity settings for the quote document.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.addColumn('clients', 'billingAddress', { type: DataTypes.TEXT, allowNull: true });
	await qi.addColumn('clients', 'taxNumber', { type: DataTypes.STRING(60), allowNull: true });
	await qi.addColumn('clients', 'notes', { type: DataTypes.TEXT, allowNull: true });
	await qi.createTable('client_changes', {
		id,
		clientId: ref('clients'),
		changedById: ref('users', 'RESTRICT'),
		field: { type: DataTypes.STRING(40), allowNull: false },
		oldValue: { type: DataTypes.TEXT, allowNull: true },
		newValue: { type: DataTypes.TEXT, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('client_changes', ['clientId', 'createdAt']);

	// The day a sent quote stops being acceptable (stamped when it is sent, from the validity setting).
	await qi.addColumn('quotes', 'validUntil', { type: DataTypes.DATEONLY, allowNull: true });
	await qi.addColumn('quotes', 'acceptedById', ref('users', 'RESTRICT', true));
	// The terms exactly as the person accepting them saw them.
	await qi.addColumn('quotes', 'acceptedTerms', { type: DataTypes.TEXT, allowNull: true });
	// The client's last answer other than acceptance; the quote is back with the desk until resent.
	await qi.addColumn('quotes', 'clientResponse', { type: DataTypes.ENUM('declined', 'change-requested'), allowNull: true });
	await qi.addColumn('quotes', 'clientMessage', { type: DataTypes.TEXT, allowNull: true });
	await qi.addColumn('quotes', 'respondedAt', { type: DataTypes.DATE, allowNull: true });

	await qi.createTable('desk_notices', {
		id,
		quoteId: ref('quotes'),
		kind: { type: DataTypes.ENUM('accepted', 'declined', 'change-requested', 'paid'), allowNull: false },
		message: { type: DataTypes.TEXT, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('desk_notices', ['createdAt']);

	await qi.createTable('password_resets', {
		id,
		userId: ref('users'),
		tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
		expiresAt: { type: DataTypes.DATE, allowNull: false },
		usedAt: { type: DataTypes.DATE, allowNull: true },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	// Null until the person chooses a password (clients start with an unusable random one).
	await qi.addColumn('users', 'passwordSetAt', { type: DataTypes.DATE, allowNull: true });
	// Staff have always chosen their passwords (or been given one); clients are asked only if they never signed in.
	await qi.sequelize.query("UPDATE users SET passwordSetAt = createdAt WHERE role <> 'client' OR lastSignInAt IS NOT NULL");

	// The quote document goes with the quote e-mail; kept with the message so a retry sends it too.
	await qi.addColumn('outbound_emails', 'attachments', { type: DataTypes.JSON, allowNull: true });

	await qi.addColumn('company_settings', 'companyAddress', { type: DataTypes.TEXT, allowNull: true });
	await qi.addColumn('company_settings', 'companyTaxNumber', { type: DataTypes.STRING(60), allowNull: true });
	await qi.addColumn('company_settings', 'companyContact', { type: DataTypes.STRING(200), allowNull: true });
	await qi.addColumn('company_settings', 'salesDeskEmail', { type: DataTypes.STRING(254), allowNull: true });
	await qi.addColumn('company_settings', 'quoteValidityDays', { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 30 });
	await qi.addColumn('company_settings', 'logoFile', { type: DataTypes.STRING(100), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	for (const column of ['logoFile', 'quoteValidityDays', 'salesDeskEmail', 'companyContact', 'companyTaxNumber', 'companyAddress']) {
		await qi.removeColumn('company_settings', column);
	}
	await qi.removeColumn('outbound_emails', 'attachments');
	await qi.removeColumn('users', 'passwordSetAt');
	await qi.dropTable('password_resets');
	await qi.dropTable('desk_notices');
	for (const column of ['respondedAt', 'clientMessage', 'clientResponse', 'acceptedTerms', 'acceptedById', 'validUntil']) {
		await qi.removeColumn('quotes', column);
	}
	await qi.dropTable('client_changes');
	for (const column of ['notes', 'taxNumber', 'billingAddress']) await qi.removeColumn('clients', column);
}
