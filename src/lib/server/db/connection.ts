import * as mariadb from 'mariadb';
import { Sequelize } from 'sequelize';
import { initModels } from './models';

export interface DatabaseConfig {
	host: string;
	port: number;
	database: string;
	user: string;
	password: string;
}

/** Reads the connection settings from an environment object, failing fast on anything missing. */
export function databaseConfigFrom(env: Record<string, string | undefined>): DatabaseConfig {
	const missing = ['DATABASE_NAME', 'DATABASE_USER', 'DATABASE_PASSWORD'].filter((k) => !env[k]);
	if (missing.length > 0) {
		throw new Error(`Database settings missing: ${missing.join(', ')} (copy .env.example to .env)`);
	}
	return {
		host: env.DATABASE_HOST || '127.0.0.1',
		port: Number(env.DATABASE_PORT || 3307),
		database: env.DATABASE_NAME!,
		user: env.DATABASE_USER!,
		password: env.DATABASE_PASSWORD!
	};
}

/**
 * One Sequelize instance with every model registered; used by the app, the scripts and the tests.
 * `pool` gives a small separate pool without models (the sign-in throttle's, see sign-in-throttle.ts).
 */
export function createSequelize(config: DatabaseConfig, separate?: { pool: { max: number; acquire: number } }): Sequelize {
	const sequelize = new Sequelize(config.database, config.user, config.password, {
		host: config.host,
		port: config.port,
		dialect: 'mariadb',
		dialectModule: mariadb,
		logging: false,
		timezone: '+00:00',
		// Short timeouts so a stopped database turns into a quick 503, not a hung request.
		dialectOptions: { connectTimeout: 3000, acquireTimeout: 5000 },
		// Bookings racing for the same stock queue on row locks while holding a connection: allow a wait.
		pool: { min: 0, idle: 10_000, ...(separate?.pool ?? { max: 20, acquire: 20_000 }) }
	});
	if (!separate) initModels(sequelize);
	return sequelize;
}
