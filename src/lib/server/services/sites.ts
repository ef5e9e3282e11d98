/** Sites and their receivers: list, read, create, update, delete. Quotes keep their own snapshot. */
import type { Transaction } from 'sequelize';
import type { ReceiverInput, SiteInput, SiteSnapshot, SiteUpdateInput } from '$lib/schemas/sites';
import { db, Site, SiteReceiver } from '../db';
import { DomainError } from './errors';

export interface SiteRow extends SiteInput {
	id: number;
	updatedAt: string;
}

export interface SiteListRow {
	id: number;
	name: string;
	address: string;
	ground: SiteInput['ground'];
	receiverCount: number;
	updatedAt: string;
}

function receiverOf(r: SiteReceiver): ReceiverInput {
	return {
		name: r.name,
		x: r.x,
		y: r.y,
		heightM: r.heightM,
		limitDb: r.limitDb,
		weighting: r.weighting,
		bandHz: r.bandHz === null ? null : (Number(r.bandHz) as 63 | 125),
		period: r.period,
		notes: r.notes
	};
}

function rowOf(site: Site): SiteRow {
	const receivers = [...(site.receivers ?? [])].sort((a, b) => a.sortOrder - b.sortOrder || a.id - b.id);
	return {
		id: site.id,
		name: site.name,
		address: site.address,
		notes: site.notes,
		ground: site.ground,
		groundFactor: site.groundFactor,
		aimDeg: site.aimDeg,
		positionHeightM: site.positionHeightM,
		allowanceDb: site.allowanceDb,
		units: site.units,
		receivers: receivers.map(receiverOf),
		updatedAt: site.updatedAt.toISOString()
	};
}

export async function listSites(): Promise<SiteListRow[]> {
	const sites = await Site.findAll({
		include: [{ model: SiteReceiver, as: 'receivers', attributes: ['id'] }],
		order: [['name', 'ASC'], ['id', 'ASC']]
	});
	return sites.map((s) => ({
		id: s.id,
		name: s.name,
		address: s.address,
		ground: s.ground,
		receiverCount: s.receivers?.length ?? 0,
		updatedAt: s.updatedAt.toISOString()
	}));
}

async function load(id: number, transaction?: Transaction): Promise<Site> {
	const site = await Site.findByPk(id, { include: [{ model: SiteReceiver, as: 'receivers' }], transaction });
	if (!site) throw new DomainError(404, 'No such site.');
	return site;
}

export async function getSite(id: number): Promise<SiteRow> {
	return rowOf(await load(id));
}

/** Null when there is no such site (callers decide whether that is a 404 or a field error). */
export async function findSite(id: number): Promise<SiteRow | null> {
	const site = await Site.findByPk(id, { include: [{ model: SiteReceiver, as: 'receivers' }] });
	return site ? rowOf(site) : null;
}

async function writeReceivers(siteId: number, receivers: ReceiverInput[], transaction: Transaction) {
	await SiteReceiver.destroy({ where: { siteId }, transaction });
	await SiteReceiver.bulkCreate(
		receivers.map((r, i) => ({ ...r, siteId, sortOrder: i })),
		{ transaction }
	);
}

function columnsOf(input: SiteUpdateInput) {
	const { receivers: _r, ...columns } = input;
	// A G value only means something for a ground of one's own; keep the row free of stale numbers.
	if (columns.ground !== undefined && columns.ground !== 'custom') columns.groundFactor = null;
	return columns;
}

export async function createSite(input: SiteInput): Promise<SiteRow> {
	const id = await db().transaction(async (transaction) => {
		const site = await Site.create(columnsOf(input) as SiteInput, { transaction });
		await writeReceivers(site.id, input.receivers, transaction);
		return site.id;
	});
	return getSite(id);
}

/** Changes the given fields; receivers, when sent, replace the whole list. */
export async function updateSite(id: number, changes: SiteUpdateInput): Promise<SiteRow> {
	await db().transaction(async (transaction) => {
		const site = await Site.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
		if (!site) throw new DomainError(404, 'No such site.');
		const columns = columnsOf(changes);
		if ((columns.ground ?? site.ground) === 'custom' && (columns.groundFactor ?? site.groundFactor) === null) {
			throw new DomainError(422, 'Some fields need attention.', { groundFactor: ['Enter G between 0 (hard) and 1 (porous)'] });
		}
		await site.update(columns, { transaction });
		if (changes.receivers) await writeReceivers(id, changes.receivers, transaction);
		// Touch the row so the list shows when receivers alone changed.
		else site.changed('updatedAt', true);
		await site.save({ transaction });
	});
	return getSite(id);
}

/** Deleting a site is safe: quotes evaluated with it keep their own snapshot. */
export async function deleteSite(id: number): Promise<void> {
	const count = await Site.destroy({ where: { id } });
	if (count === 0) throw new DomainError(404, 'No such site.');
}

/** The copy a quote version keeps of the site it was evaluated with. */
export function snapshotOf(site: SiteRow): SiteSnapshot {
	const { id, updatedAt: _u, ...fields } = site;
	return { ...fields, siteId: id };
}
