import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Gear data for the v2 acoustic model. Loudspeaker models gain their per-band response (dB re the
 * sensitivity), power compression and a horizontal directivity table; package groups gain their height
 * above ground, the spacing between their outermost stacks and an optional pattern of their own.
 *
 * The band response and the directivity table are JSON columns, not child tables: they are always read
 * and written whole with their model (never queried by band or angle), the shared zod schema checks
 * their shape at every door, and spec history can show one old → new value per field.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.addColumn('loudspeaker_models', 'bandResponseDb', { type: DataTypes.JSON, allowNull: true });
	await qi.addColumn('loudspeaker_models', 'compressionDb', { type: DataTypes.DOUBLE, allowNull: true });
	await qi.addColumn('loudspeaker_models', 'directivity', { type: DataTypes.JSON, allowNull: true });
	await qi.addColumn('package_groups', 'heightM', { type: DataTypes.DOUBLE, allowNull: true });
	await qi.addColumn('package_groups', 'spacingM', { type: DataTypes.DOUBLE, allowNull: true });
	await qi.addColumn('package_groups', 'directivity', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	for (const column of ['directivity', 'spacingM', 'heightM']) await qi.removeColumn('package_groups', column);
	for (const column of ['directivity', 'compressionDb', 'bandResponseDb']) await qi.removeColumn('loudspeaker_models', column);
}
