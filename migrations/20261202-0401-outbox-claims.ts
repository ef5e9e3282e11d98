import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Several app processes share one outbox: a sender first claims a row (status `sending`, with the
 * time and the process that claimed it), so two retry timers never send the same message twice.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.changeColumn('outbound_emails', 'status', {
		type: DataTypes.ENUM('pending', 'sending', 'sent', 'failed'),
		allowNull: false,
		defaultValue: 'pending'
	});
	await qi.addColumn('outbound_emails', 'claimedAt', { type: DataTypes.DATE, allowNull: true });
	await qi.addColumn('outbound_emails', 'claimedBy', { type: DataTypes.STRING(100), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeColumn('outbound_emails', 'claimedBy');
	await qi.removeColumn('outbound_emails', 'claimedAt');
	await qi.sequelize.query(`UPDATE outbound_emails SET status = 'failed' WHERE status = 'sending'`);
	await qi.changeColumn('outbound_emails', 'status', {
		type: DataTypes.ENUM('pending', 'sent', 'failed'),
		allowNull: false,
		defaultValue: 'pending'
	});
}
