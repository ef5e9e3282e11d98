import type { QueryInterface } from 'sequelize';

/**
 * Indexes for a large catalogue (measured with 50,000 stock units and 5,000 hires, tests/bench):
 * ready units counted per model read the index alone; a hire's cabinet and amplifier totals read
 * its lines from the index; the quote list comes newest first without sorting every quote.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.addIndex('stock_units', ['status', 'modelType', 'loudspeakerModelId', 'amplifierModelId'], { name: 'stock_units_ready_per_model' });
	await qi.addIndex('booking_lines', ['bookingId', 'modelType', 'quantity'], { name: 'booking_lines_totals' });
	await qi.addIndex('quotes', ['updatedAt'], { name: 'quotes_updated_at' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.removeIndex('quotes', 'quotes_updated_at');
	await qi.removeIndex('booking_lines', 'booking_lines_totals');
	await qi.removeIndex('stock_units', 'stock_units_ready_per_model');
}
