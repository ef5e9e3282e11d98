import { DataTypes, type QueryInterface } from 'sequelize';

/** Which stock units (by serial) go out on a booking, as the warehouse assigns them. */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('booking_units', {
		id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
		bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'bookings', key: 'id' }, onDelete: 'CASCADE' },
		stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'stock_units', key: 'id' }, onDelete: 'RESTRICT' },
		createdAt: { type: DataTypes.DATE, allowNull: false },
		updatedAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('booking_units', ['bookingId', 'stockUnitId'], { unique: true });
	await qi.addIndex('booking_units', ['stockUnitId']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('booking_units');
}
