/**
 * A larger hire company for the bench: grows the bench database to a given size by copying the demo
 * catalogue (clones of its models, packages built like its packages, ready units, confirmed hires
 * with their quotes). Sizes are totals, so growing from 10× to 100× adds only the difference.
 */
import { QueryTypes, type Sequelize } from 'sequelize';

export interface CatalogueSize {
	label: string;
	packages: number;
	stockUnits: number;
	bookings: number;
}

/** 10× and 100× the demo's packages; units and hires as the issue sets them. */
export const SIZES: CatalogueSize[] = [
	{ label: '10×', packages: 60, stockUnits: 10_000, bookings: 500 },
	{ label: '100×', packages: 600, stockUnits: 50_000, bookings: 5_000 }
];

type Row = Record<string, unknown>;

const select = (db: Sequelize, sql: string, replacements: Row = {}) =>
	db.query<Row>(sql, { type: QueryTypes.SELECT, replacements });

async function count(db: Sequelize, table: string): Promise<number> {
	const [row] = await select(db, `SELECT COUNT(*) AS n FROM \`${table}\``);
	return Number(row.n);
}

/** A copied row made ready to insert again: no id, JSON columns as text. */
function copyOf(row: Row, changes: Row): Row {
	const { id: _id, ...rest } = { ...row, ...changes };
	for (const [key, value] of Object.entries(rest)) {
		if (value !== null && typeof value === 'object' && !(value instanceof Date) && !Buffer.isBuffer(value)) rest[key] = JSON.stringify(value);
	}
	return rest;
}

async function insertAll(db: Sequelize, table: string, rows: Row[]): Promise<void> {
	for (let i = 0; i < rows.length; i += 1000) await db.getQueryInterface().bulkInsert(table, rows.slice(i, i + 1000));
}

const day = (offset: number) => new Date(Date.UTC(2027, 0, 1) + offset * 86_400_000).toISOString().slice(0, 10);

/** Grows the catalogue to `size` (never shrinks it); answers what it added. */
export async function growCatalogue(db: Sequelize, size: CatalogueSize): Promise<string> {
	const now = new Date();
	const demoPackages = await select(db, 'SELECT id FROM packages ORDER BY id LIMIT 12');
	const groupsOf = new Map<number, Row[]>();
	for (const g of await select(db, 'SELECT * FROM package_groups WHERE packageId IN (:ids) ORDER BY position', { ids: demoPackages.map((p) => p.id) })) {
		const list = groupsOf.get(Number(g.packageId)) ?? [];
		list.push(g);
		groupsOf.set(Number(g.packageId), list);
	}
	const loudspeakers = await select(db, 'SELECT * FROM loudspeaker_models ORDER BY id');
	const amplifiers = await select(db, 'SELECT * FROM amplifier_models ORDER BY id');

	// Packages: each a copy of a demo package's groups, pointing at a fresh clone of each model.
	const havePackages = await count(db, 'packages');
	for (let n = havePackages; n < size.packages; n++) {
		const template = demoPackages[n % demoPackages.length];
		await insertAll(db, 'packages', [
			{ name: `Bench package ${n}`, slug: `bench-package-${n}`, description: 'Generated for the bench.', active: true, createdAt: now, updatedAt: now }
		]);
		const id = Number((await select(db, 'SELECT id FROM packages WHERE slug = :slug', { slug: `bench-package-${n}` }))[0].id);
		for (const group of groupsOf.get(Number(template.id)) ?? []) {
			const speaker = loudspeakers.find((l) => l.id === group.loudspeakerModelId)!;
			const amp = amplifiers.find((a) => a.id === group.amplifierModelId)!;
			const tag = `(bench ${n}.${group.position})`;
			await insertAll(db, 'loudspeaker_models', [copyOf(speaker, { name: `${speaker.name} ${tag}`.slice(0, 120), createdAt: now, updatedAt: now })]);
			await insertAll(db, 'amplifier_models', [copyOf(amp, { name: `${amp.name} ${tag}`.slice(0, 120), createdAt: now, updatedAt: now })]);
			const [{ ls }] = await select(db, 'SELECT MAX(id) AS ls FROM loudspeaker_models');
			const [{ am }] = await select(db, 'SELECT MAX(id) AS am FROM amplifier_models');
			await insertAll(db, 'package_groups', [copyOf(group, { packageId: id, loudspeakerModelId: ls, amplifierModelId: am })]);
		}
	}

	// Ready units spread over every model, a few more of each than the packages need.
	const models = [
		...(await select(db, "SELECT id, 'loudspeaker' AS type FROM loudspeaker_models")),
		...(await select(db, "SELECT id, 'amplifier' AS type FROM amplifier_models"))
	];
	const haveUnits = await count(db, 'stock_units');
	const units: Row[] = [];
	for (let n = haveUnits; n < size.stockUnits; n++) {
		const model = models[n % models.length];
		units.push({
			serial: `BENCH-${n}`, modelType: model.type, status: n % 20 === 0 ? 'in-repair' : 'ready', location: `Bay ${n % 40}`, notes: '',
			loudspeakerModelId: model.type === 'loudspeaker' ? model.id : null, amplifierModelId: model.type === 'amplifier' ? model.id : null,
			lastTestedAt: null, createdAt: now, updatedAt: now
		});
	}
	await insertAll(db, 'stock_units', units);

	// Confirmed hires over five years, each with its quote copied from a demo quote version.
	const [template] = await select(db, 'SELECT * FROM quote_versions ORDER BY id LIMIT 1');
	const [quote] = await select(db, 'SELECT clientId, createdById FROM quotes ORDER BY id LIMIT 1');
	const packages = await select(db, 'SELECT packageId, loudspeakerModelId, amplifierModelId, `count` FROM package_groups');
	const haveBookings = await count(db, 'bookings');
	for (let n = haveBookings; n < size.bookings; n += 500) {
		const batch = Math.min(500, size.bookings - n);
		await insertAll(db, 'quotes', Array.from({ length: batch }, (_, i) => ({
			clientId: quote.clientId, eventName: `Bench hire ${n + i}`, status: 'confirmed', currentVersion: 1, needsRecheck: false,
			createdById: quote.createdById, sentAt: now, acceptedAt: now, createdAt: now, updatedAt: now
		})));
		const quoteIds = (await select(db, 'SELECT id FROM quotes WHERE eventName LIKE :prefix ORDER BY id DESC LIMIT :batch', { prefix: 'Bench hire %', batch })).map((r) => Number(r.id)).reverse();
		const versions: Row[] = [];
		const bookings: Row[] = [];
		quoteIds.forEach((quoteId, i) => {
			const start = ((n + i) * 11) % 1800;
			const group = packages[(n + i) % packages.length];
			versions.push(copyOf(template, { quoteId, version: 1, packageId: group.packageId, startDate: day(start), endDate: day(start + ((n + i) % 3)), createdAt: now, updatedAt: now }));
			bookings.push({ quoteId, status: 'confirmed', startDate: day(start), endDate: day(start + ((n + i) % 3)), createdAt: now, updatedAt: now });
		});
		await insertAll(db, 'quote_versions', versions);
		await insertAll(db, 'bookings', bookings);
		const bookingRows = await select(db, 'SELECT id, quoteId FROM bookings WHERE quoteId IN (:quoteIds)', { quoteIds });
		const lines: Row[] = [];
		bookingRows.forEach((b, i) => {
			const group = packages[(n + i) % packages.length];
			lines.push({ bookingId: b.id, modelType: 'loudspeaker', modelId: group.loudspeakerModelId, quantity: group.count, createdAt: now, updatedAt: now });
			lines.push({ bookingId: b.id, modelType: 'amplifier', modelId: group.amplifierModelId, quantity: Math.max(1, Math.ceil(Number(group.count) / 4)), createdAt: now, updatedAt: now });
		});
		await insertAll(db, 'booking_lines', lines);
	}
	// Tell the app processes (change stamps): their cached catalogue and bookings are stale now.
	await db.query("INSERT INTO cache_stamps (name, version) VALUES ('catalogue', 1), ('bookings', 1) ON DUPLICATE KEY UPDATE version = version + 1", { type: QueryTypes.INSERT });
	return `${size.label}: ${await count(db, 'packages')} packages, ${await count(db, 'loudspeaker_models') + (await count(db, 'amplifier_models'))} models, ${await count(db, 'stock_units')} units, ${await count(db, 'bookings')} bookings`;
}

/** A booking of the generated catalogue, for the pick-list page. */
export async function someBookingId(db: Sequelize): Promise<number> {
	const [row] = await select(db, "SELECT b.id FROM bookings b JOIN quotes q ON q.id = b.quoteId WHERE b.status = 'confirmed' ORDER BY b.id DESC LIMIT 1");
	return Number(row.id);
}
