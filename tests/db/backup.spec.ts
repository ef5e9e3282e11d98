/**
 * `npm run backup` then `npm run restore` into a fresh database: every table holds the same rows
 * (CHECKSUM TABLE per table) and every stored file the same bytes (SHA-256 per file).
 * Needs the test world's database (scripts/test-world.sh services).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { createSequelize, databaseConfigFrom } from '../../src/lib/server/db/connection';
import { putStoredFile } from '../../src/lib/server/storage/stored-files';
import { useTestDatabase } from '../helpers/db';

const source = useTestDatabase();
const FRESH = `${process.env.DATABASE_NAME}_restore`;
const rootCnf = path.resolve(process.env.DB_DIR ?? '.data/test/mariadb', 'my.cnf');

function asRoot(sql: string): void {
	execFileSync('mariadb', [`--defaults-file=${rootCnf}`, '-e', sql]);
}

async function tableChecksums(sequelize: Sequelize, database: string): Promise<Record<string, string>> {
	const tables = await sequelize.query<{ name: string }>(
		`SELECT table_name AS name FROM information_schema.tables WHERE table_schema = :database ORDER BY table_name`,
		{ type: QueryTypes.SELECT, replacements: { database } }
	);
	const sums: Record<string, string> = {};
	for (const { name } of tables) {
		const [row] = await sequelize.query<{ Checksum: string | number }>(`CHECKSUM TABLE \`${name}\` EXTENDED`, {
			type: QueryTypes.SELECT
		});
		sums[name] = String(row.Checksum);
	}
	return sums;
}

async function fileHashes(sequelize: Sequelize): Promise<Record<string, string>> {
	const rows = await sequelize.query<{ name: string; sha: string; kept: string }>(
		'SELECT name, SHA2(bytes, 256) AS sha, sha256 AS kept FROM stored_files ORDER BY name',
		{ type: QueryTypes.SELECT }
	);
	for (const row of rows) expect(row.sha, `bytes of ${row.name}`).toBe(row.kept);
	return Object.fromEntries(rows.map((r) => [r.name, r.sha]));
}

/** Runs `npm run backup` into a folder of its own; answers the file it wrote. */
function takeBackup(): string {
	const backupDir = mkdtempSync(path.join(tmpdir(), 'throwline-backup-'));
	execFileSync('bash', ['scripts/backup.sh'], { env: { ...process.env, BACKUP_DIR: backupDir } });
	const [file] = readdirSync(backupDir);
	return path.join(backupDir, file);
}

let restored: Sequelize | null = null;
afterAll(async () => {
	await restored?.close();
	asRoot(`DROP DATABASE IF EXISTS \`${FRESH}\``);
});

describe('backup and restore', () => {
	it('restores a backup into a fresh database with every row and every file equal', async () => {
		// A stored file with every byte value, so no encoding step can hide a change.
		const bytes = Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.from(Array.from({ length: 256 * 64 }, (_, i) => i % 256))]);
		await putStoredFile(`${randomUUID()}.pdf`, 'application/pdf', bytes);

		// Other test files write while this runs: a dump taken between two equal readings holds them.
		let backup: { file: string; before: Record<string, string> } | null = null;
		for (let attempt = 0; attempt < 8 && !backup; attempt++) {
			const first = await tableChecksums(source, process.env.DATABASE_NAME!);
			const file = takeBackup();
			const before = await tableChecksums(source, process.env.DATABASE_NAME!);
			if (JSON.stringify(first) === JSON.stringify(before)) backup = { file, before };
		}
		expect(backup, 'a quiet moment for the backup').not.toBeNull();
		const { file, before } = backup!;
		expect(path.basename(file)).toMatch(/^\d{8}T\d{6}Z\.sql\.gz$/);
		const filesBefore = await fileHashes(source);

		asRoot(
			`DROP DATABASE IF EXISTS \`${FRESH}\`; CREATE DATABASE \`${FRESH}\`; ` +
				`GRANT ALL PRIVILEGES ON \`${FRESH}\`.* TO '${process.env.DATABASE_USER}'@'127.0.0.1'`
		);
		execFileSync('bash', ['scripts/restore.sh', file, '--yes'], {
			env: { ...process.env, DATABASE_NAME: FRESH }
		});

		restored = createSequelize({ ...databaseConfigFrom(process.env), database: FRESH });
		expect(Object.keys(before).length).toBeGreaterThan(10);
		expect(await tableChecksums(restored, FRESH)).toEqual(before);
		expect(Object.keys(filesBefore).length).toBeGreaterThan(0);
		expect(await fileHashes(restored)).toEqual(filesBefore);
	});

	it('refuses without the typed confirmation and changes nothing', async () => {
		const file = takeBackup();
		const before = await tableChecksums(source, process.env.DATABASE_NAME!);
		expect(() =>
			execFileSync('bash', ['scripts/restore.sh', file], {
				env: { ...process.env, ORIGIN: '' },
				input: 'not-the-name\n',
				stdio: ['pipe', 'pipe', 'pipe']
			})
		).toThrow();
		expect(await tableChecksums(source, process.env.DATABASE_NAME!)).toEqual(before);
	});
});
