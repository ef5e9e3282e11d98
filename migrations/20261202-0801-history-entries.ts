import type { QueryInterface } from 'sequelize';

/**
 * The inventory history records packages and stock units as well as loudspeaker and amplifier specs,
 * so its table is named for what it holds: one history entry per changed field. Data and keys stay.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.renameTable('spec_changes', 'history_entries');
	await qi.sequelize.query('ALTER TABLE `history_entries` RENAME INDEX `spec_changes_model` TO `history_entries_record`');
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.sequelize.query('ALTER TABLE `history_entries` RENAME INDEX `history_entries_record` TO `spec_changes_model`');
	await qi.renameTable('history_entries', 'spec_changes');
}
