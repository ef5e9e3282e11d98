/**
 * Schema migrations and demo seeders with umzug, outside Vite:
 *   node --env-file=.env --import tsx scripts/migrate.ts up|down|seed|status
 * Each runner keeps its own meta table, so seeding twice is a no-op.
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
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

export async function migrate(sequelize: Sequelize, command: string): Promise<string[]> {
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
