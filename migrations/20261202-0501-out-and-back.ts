import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (table: string, allowNull = false, onDelete = 'RESTRICT') => ({
	type: DataTypes.INTEGER.UNSIGNED,
	allowNull,
	references: { model: table, key: 'id' },
	onDelete
});

/**
 * Out and back: the booking's life cycle (confirmed → out → back → closed), which serials left and
 * came back (who, when), damage reports, repairs, electrical safety test intervals, delivery address.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.changeColumn('bookings', 'status', {
		type: DataTypes.ENUM('confirmed', 'out', 'back', 'closed', 'cancelled'),
		allowNull: false
	});
	await qi.addColumn('bookings', 'siteAddress', { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' });

	await qi.addColumn('booking_units', 'dispatchedAt', { type: DataTypes.DATE, allowNull: true });
	await qi.addColumn('booking_units', 'dispatchedById', ref('users', true, 'SET NULL'));
	await qi.addColumn('booking_units', 'returnedAt', { type: DataTypes.DATE, allowNull: true });
	await qi.addColumn('booking_units', 'returnedById', ref('users', true, 'SET NULL'));

	await qi.createTable('booking_events', {
		id,
		bookingId: ref('bookings', false, 'CASCADE'),
		kind: { type: DataTypes.ENUM('dispatch', 'return', 'state'), allowNull: false },
		stockUnitId: ref('stock_units', true, 'SET NULL'),
		state: { type: DataTypes.STRING(20), allowNull: true },
		userId: ref('users', true, 'SET NULL'),
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('booking_events', ['bookingId', 'createdAt'], { name: 'booking_events_booking' });

	await qi.createTable('damage_reports', {
		id,
		stockUnitId: ref('stock_units', false, 'CASCADE'),
		bookingId: ref('bookings', true, 'SET NULL'),
		notes: { type: DataTypes.TEXT, allowNull: false },
		photoStoredName: { type: DataTypes.STRING(80), allowNull: true },
		photoMimeType: { type: DataTypes.STRING(60), allowNull: true },
		photoOriginalName: { type: DataTypes.STRING(200), allowNull: true },
		reportedById: ref('users', true, 'SET NULL'),
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('damage_reports', ['stockUnitId'], { name: 'damage_reports_unit' });

	await qi.createTable('repairs', {
		id,
		stockUnitId: ref('stock_units', false, 'CASCADE'),
		description: { type: DataTypes.STRING(500), allowNull: false },
		costMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		done: { type: DataTypes.BOOLEAN, allowNull: false },
		recordedById: ref('users', true, 'SET NULL'),
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('repairs', ['stockUnitId'], { name: 'repairs_unit' });

	await qi.createTable('model_test_intervals', {
		id,
		modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
		modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		days: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('model_test_intervals', ['modelType', 'modelId'], { unique: true, name: 'model_test_intervals_model' });

	await qi.addColumn('company_settings', 'testIntervalDays', { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 365 });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeColumn('company_settings', 'testIntervalDays');
	for (const table of ['model_test_intervals', 'repairs', 'damage_reports', 'booking_events']) await qi.dropTable(table);
	for (const column of ['returnedById', 'returnedAt', 'dispatchedById', 'dispatchedAt']) await qi.removeColumn('booking_units', column);
	await qi.removeColumn('bookings', 'siteAddress');
	await qi.sequelize.query(`UPDATE bookings SET status = 'confirmed' WHERE status IN ('out', 'back', 'closed')`);
	await qi.changeColumn('bookings', 'status', { type: DataTypes.ENUM('confirmed', 'cancelled'), allowNull: false });
}
