/**
 * Schema migrations and demo seeders with umzug, outside Vite:
 *   node --env-file=.env --import tsx scripts/migrate.ts up|down|seed|status
 * Each runner keeps its own meta table, so seeding twice is a no-op.
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { QueryTypes, type QueryInterface, type Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { createSequelize, databaseConfigFrom } from '../src/lib/server/db/connection';

type Step = {
	up: (params: { context: StepContext }) => Promise<unknown>;
	down?: (params: { context: StepContext }) => Promise<unknown>;
};
export type StepContext = QueryInterface & { sequelize: Sequelize };

function runner(sequelize: Sequelize, folder: 'migrations' | 'seeders') {
	const context = Object.assign(sequelize.getQueryInterface(), { sequelize }) as StepContext;
	return new Umzug<StepContext>({
		migrations: {
			glob: [`${folder}/*.ts`, { cwd: process.cwd() }],
			resolve: ({ name, path: file, context: ctx }) => {
				const load = () => import(pathToFileURL(path.resolve(file!)).href) as Promise<Step>;
				return {
					name,
					up: async () => (await load()).up({ context: ctx }),
					down: async () => (await load()).down?.({ context: ctx })
				};
			}
		},
		context,
		storage: new SequelizeStorage({
			sequelize,
			modelName: folder === 'migrations' ? 'SequelizeMeta' : 'SeederMeta'
		}),
		logger: undefined
	});
}

const LOCK_NAME = 'throwline-migrate';
const LOCK_WAIT_S = 60;

/**
 * Runs `work` while holding a MariaDB named lock, so app processes (or machines) starting together
 * migrate and seed one after the other: the second finds the work done. The lock belongs to one
 * connection, kept for the whole run by an otherwise empty transaction; umzug uses other connections.
 */
export async function underMigrationLock<T>(sequelize: Sequelize, work: () => Promise<T>): Promise<T> {
	return sequelize.transaction(async (transaction) => {
		const [{ got }] = await sequelize.query<{ got: number | null }>('SELECT GET_LOCK(:name, :wait) AS got', {
			type: QueryTypes.SELECT,
			replacements: { name: LOCK_NAME, wait: LOCK_WAIT_S },
			transaction
		});
		if (Number(got) !== 1) throw new Error(`another process held the "${LOCK_NAME}" lock for ${LOCK_WAIT_S} s`);
		try {
			return await work();
		} finally {
			await sequelize.query('SELECT RELEASE_LOCK(:name)', {
				type: QueryTypes.SELECT,
				replacements: { name: LOCK_NAME },
				transaction
			});
		}
	});
}

export function migrate(sequelize: Sequelize, command: string): Promise<string[]> {
	return underMigrationLock(sequelize, () => migrateUnlocked(sequelize, command));
}

async function migrateUnlocked(sequelize: Sequelize, command: string): Promise<string[]> {
	switch (command) {
		case 'up':
			return (await runner(sequelize, 'migrations').up()).map((m) => m.name);
		case 'down':
			return (await runner(sequelize, 'migrations').down()).map((m) => m.name);
		case 'seed':
			return (await runner(sequelize, 'seeders').up()).map((m) => m.name);
		case 'status':
			return (await runner(sequelize, 'migrations').pending()).map((m) => `pending ${m.name}`);
		default:
			throw new Error(`unknown command "${command}" (use up, down, seed or status)`);
	}
}

const isMain = import.meta.url === pathToFileURL(process.argv[1] ?? '').href;
if (isMain) {
	const command = process.argv[2] ?? 'up';
	const sequelize = createSequelize(databaseConfigFrom(process.env));
	try {
		const done = await migrate(sequelize, command);
		console.log(`[${command}] ${done.length ? done.join(', ') : 'nothing to do'}`);
	} catch (err) {
		console.error(`[${command}] failed: ${(err as Error).message}`);
		process.exitCode = 1;
	} finally {
		await sequelize.close();
	}
}
