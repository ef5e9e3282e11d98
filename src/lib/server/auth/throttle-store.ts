/**
 * A rate-limiter-flexible store over one MariaDB table (`sign_in_throttle`, made by migration).
 * The package's own RateLimiterMySQL drives mysql/mysql2 callback connections and `??` identifier
 * placeholders, which the mariadb connector does not offer, so this implements the four methods
 * its README asks of a store extending RateLimiterStoreAbstract, with the same atomic upsert, through Sequelize.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { RateLimiterRes, type RateLimiterStoreAbstract } from 'rate-limiter-flexible';
import StoreAbstract from 'rate-limiter-flexible/lib/RateLimiterStoreAbstract.js';

interface Row {
	points: number;
	expire: number | null;
}

type StoreOptions = ConstructorParameters<typeof RateLimiterStoreAbstract>[0] & { storeClient: Sequelize };

export class RateLimiterMariaDb extends StoreAbstract {
	private readonly sequelize: Sequelize;

	constructor(opts: StoreOptions) {
		super(opts);
		this.sequelize = opts.storeClient;
	}

	// Called by the abstract class after _upsert; mirrors the package's SQL stores.
	protected _getRateLimiterRes(_key: string, changedPoints: number, row: Row): RateLimiterRes {
		const consumed = Number(row.points);
		const isFirstInDuration = changedPoints === consumed;
		const expire = row.expire === null ? null : Number(row.expire);
		return new RateLimiterRes(
			Math.max(this.points - consumed, 0),
			expire ? Math.max(expire - Date.now(), 0) : -1,
			consumed,
			isFirstInDuration
		);
	}

	protected async _upsert(key: string, points: number, msDuration: number, forceExpire = false): Promise<Row> {
		const now = Date.now();
		const expire = msDuration > 0 ? now + msDuration : null;
		return this.sequelize.transaction(async (transaction) => {
			const sql = forceExpire
				? 'INSERT INTO sign_in_throttle (`key`, points, expire) VALUES (:key, :points, :expire) ON DUPLICATE KEY UPDATE points = :points, expire = :expire'
				: 'INSERT INTO sign_in_throttle (`key`, points, expire) VALUES (:key, :points, :expire) ON DUPLICATE KEY UPDATE ' +
					'points = IF(expire IS NOT NULL AND expire <= :now, :points, points + :points), ' +
					'expire = IF(expire IS NOT NULL AND expire <= :now, :expire, expire)';
			await this.sequelize.query(sql, { replacements: { key, points, expire, now }, type: QueryTypes.INSERT, transaction });
			const [row] = await this.sequelize.query<Row>('SELECT points, expire FROM sign_in_throttle WHERE `key` = :key', {
				replacements: { key },
				type: QueryTypes.SELECT,
				transaction
			});
			return row;
		});
	}

	protected async _get(key: string): Promise<Row | null> {
		const [row] = await this.sequelize.query<Row>(
			'SELECT points, expire FROM sign_in_throttle WHERE `key` = :key AND (expire IS NULL OR expire > :now)',
			{ replacements: { key, now: Date.now() }, type: QueryTypes.SELECT }
		);
		return row ?? null;
	}

	protected async _delete(key: string): Promise<boolean> {
		await this.sequelize.query('DELETE FROM sign_in_throttle WHERE `key` = :key', { replacements: { key }, type: QueryTypes.DELETE });
		return true;
	}
}
