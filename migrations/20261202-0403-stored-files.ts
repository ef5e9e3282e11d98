import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * Uploaded files move from the local disk into MariaDB, so every app process (and every machine)
 * reads the same files, and a database dump carries them. Files already under UPLOAD_DIR that an
 * attachment refers to are copied in; the folder itself is left alone.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('stored_files', {
		name: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
		mimeType: { type: DataTypes.STRING(100), allowNull: false },
		sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		sha256: { type: DataTypes.CHAR(64), allowNull: false },
		bytes: { type: DataTypes.BLOB('long'), allowNull: false },
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	const folder = path.resolve(process.env.UPLOAD_DIR || '.data/uploads');
	const attachments = await qi.sequelize.query<{ storedName: string; mimeType: string }>(
		'SELECT storedName, mimeType FROM model_attachments',
		{ type: QueryTypes.SELECT }
	);
	for (const { storedName, mimeType } of attachments) {
		const file = path.join(folder, path.basename(storedName));
		if (!existsSync(file)) continue;
		const bytes = readFileSync(file);
		await qi.bulkInsert('stored_files', [
			{ name: storedName, mimeType, sizeBytes: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex'), bytes, createdAt: new Date() }
		]);
	}
}

export async function down({ context: qi }: { context: QueryInterface }) {
	await qi.dropTable('stored_files');
}
