import { env } from '$env/dynamic/private';
import type { Sequelize } from 'sequelize';
import { createSequelize, databaseConfigFrom } from './connection';

export * from './models';

// Keep one pool across Vite's hot reloads in development.
const cache = globalThis as unknown as { throwlineSequelize?: Sequelize };

export function db(): Sequelize {
	cache.throwlineSequelize ??= createSequelize(databaseConfigFrom(env));
	return cache.throwlineSequelize;
}
