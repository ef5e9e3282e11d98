/**
 * Invented demo sites (Kestrel Yard Audio's regular venues) and the demo festival quote made honest:
 * it is re-evaluated against its park, keeps a snapshot of the site, and says "over the limit" when
 * the model predicts a neighbour over its licence limit. Idempotent: a site is made only when none
 * has its name; the festival quote's current version is re-evaluated with the model as it stands.
 */
import type { Transaction } from 'sequelize';
import type { StepContext } from '../scripts/migrate';
import { evaluatePackages } from '../src/lib/quotes/evaluate-packages';
import { limitsSentence } from '../src/lib/quotes/plain-language';
import type { LoadedPackage } from '../src/lib/inventory/types';
import { toModelRequest } from '../src/lib/quotes/request';
import type { QuoteRequestInput } from '../src/lib/schemas/evaluation';
import { siteSchema, type SiteInput, type SiteSnapshot } from '../src/lib/schemas/sites';
import {
	AmplifierModel, Client, CompanySettings, LoudspeakerModel, Package, PackageGroup, ProgrammeProfile, Quote, QuoteVersion,
	Site, SiteReceiver, StockUnit
} from '../src/lib/server/db/models';

const FESTIVAL_SITE = 'Millbrook Riverside Park, festival field';

// Positions in metres east (x) and north (y) of the system. Limits are invented, in the style of
// outdoor-event licence conditions (a dB(A) Leq at dwellings, a low-frequency band limit).
const SITES: SiteInput[] = [
	{
		name: FESTIVAL_SITE,
		address: 'Riverside Park, Millbrook (invented)',
		notes: 'Stage at the west end of the grass, the system aiming east across the field. The river runs along the north edge.',
		ground: 'porous', groundFactor: null, aimDeg: 90, positionHeightM: 1.5, allowanceDb: 2, units: 'm',
		receivers: [
			{ name: 'Mill Lane houses', x: -120, y: 20, heightM: 4, limitDb: 65, weighting: 'A', bandHz: null, period: '15 min Leq', notes: 'First-floor windows behind the stage' },
			{ name: 'Park fence', x: -40, y: -35, heightM: 1.5, limitDb: 75, weighting: 'A', bandHz: null, period: '15 min Leq', notes: 'Footpath along the fence behind and beside the stage' },
			{ name: 'St Brannoc’s church', x: 180, y: 260, heightM: 3, limitDb: 75, weighting: 'Z', bandHz: 63, period: '15 min Leq', notes: 'Across the river; a 63 Hz band limit' },
			{ name: 'Weir Cottages', x: 420, y: -60, heightM: 1.5, limitDb: 80, weighting: 'C', bandHz: null, period: '5 min Leq', notes: 'Past the far end of the field' }
		]
	},
	{
		name: 'St Aldric’s School playing field',
		address: 'St Aldric’s School (invented)',
		notes: 'Speech and ceremonies; the system at the pavilion aiming north up the field.',
		ground: 'porous', groundFactor: null, aimDeg: 0, positionHeightM: 1.2, allowanceDb: 0, units: 'm',
		receivers: [
			{ name: 'Orchard Road houses', x: 60, y: 160, heightM: 1.5, limitDb: 60, weighting: 'A', bandHz: null, period: '1 h Leq', notes: '' },
			{ name: 'Care home', x: -90, y: -40, heightM: 4, limitDb: 55, weighting: 'A', bandHz: null, period: '1 h Leq', notes: 'Behind the pavilion' }
		]
	},
	{
		name: 'Harbour quay',
		address: 'North Quay (invented)',
		notes: 'Paved quay over water: hard ground. The system faces south over the harbour.',
		ground: 'hard', groundFactor: null, aimDeg: 180, positionHeightM: 1.5, allowanceDb: 3, units: 'm',
		receivers: [
			{ name: 'Harbour flats', x: 150, y: -320, heightM: 10, limitDb: 65, weighting: 'A', bandHz: null, period: '15 min Leq', notes: 'Across the water' },
			{ name: 'Quayside hotel', x: -70, y: 30, heightM: 6, limitDb: 70, weighting: 'C', bandHz: null, period: '15 min Leq', notes: 'Behind the system' }
		]
	}
];

async function seedSite(input: SiteInput, transaction: Transaction): Promise<Site> {
	const site = siteSchema.parse(input);
	const { receivers, ...columns } = site;
	const [row, created] = await Site.findOrCreate({ where: { name: site.name }, defaults: columns, transaction });
	if (created) {
		await SiteReceiver.bulkCreate(receivers.map((r, i) => ({ ...r, siteId: row.id, sortOrder: i })), { transaction });
	}
	return row;
}

async function snapshotOf(site: Site, transaction: Transaction): Promise<SiteSnapshot> {
	const receivers = await SiteReceiver.findAll({ where: { siteId: site.id }, order: [['sortOrder', 'ASC']], transaction });
	return {
		siteId: site.id, name: site.name, address: site.address, notes: site.notes, ground: site.ground, groundFactor: site.groundFactor,
		aimDeg: site.aimDeg, positionHeightM: site.positionHeightM, allowanceDb: site.allowanceDb, units: site.units,
		receivers: receivers.map((r) => ({
			name: r.name, x: r.x, y: r.y, heightM: r.heightM, limitDb: r.limitDb, weighting: r.weighting,
			bandHz: r.bandHz === null ? null : (Number(r.bandHz) as 63 | 125), period: r.period, notes: r.notes
		}))
	};
}

async function loadPackage(id: number, transaction: Transaction): Promise<LoadedPackage> {
	const pkg = await Package.findByPk(id, {
		include: [{ model: PackageGroup, as: 'groups', include: [{ model: LoudspeakerModel, as: 'loudspeaker' }, { model: AmplifierModel, as: 'amplifier' }] }],
		transaction
	});
	return pkg!.get({ plain: true }) as unknown as LoadedPackage;
}

/** The festival quote's current version, evaluated against its park by the same code the desk uses. */
async function reevaluateFestival(site: Site, transaction: Transaction) {
	const client = await Client.findOne({ where: { email: 'organiser@millbrook-riverside.test' }, transaction });
	const quote = client && (await Quote.findOne({ where: { clientId: client.id, eventName: 'Riverside food festival, main stage' }, transaction }));
	if (!quote) return;
	const version = await QuoteVersion.findOne({ where: { quoteId: quote.id, version: quote.currentVersion }, transaction });
	if (!version || version.packageId === null) return; // a demo quote on a composed system keeps its own evaluation
	// The park's receivers carry the licence limits now; the single on-axis boundary is dropped.
	const { boundary: _b, ...rest } = version.request;
	const request: QuoteRequestInput = { ...rest, siteId: site.id };
	const snapshot = await snapshotOf(site, transaction);
	const settings = (await CompanySettings.findByPk(1, { transaction }))!;
	const programme = (await ProgrammeProfile.findOne({ where: { slug: request.programme }, transaction }))!;
	const bandsDb = Object.fromEntries(Object.entries(programme.bands).map(([band, level]) => [Number(band), level]));
	const inService: Record<string, number> = {};
	for (const u of await StockUnit.findAll({ where: { status: 'ready' }, transaction })) {
		const key = `${u.modelType}:${u.loudspeakerModelId ?? u.amplifierModelId}`;
		inService[key] = (inService[key] ?? 0) + 1;
	}
	const [result] = evaluatePackages([await loadPackage(version.packageId, transaction)], {
		request: toModelRequest(request, { bandsDb, crestFactorDb: programme.crestFactorDb }, settings.defaultMarginDb, snapshot),
		startDate: request.startDate,
		endDate: request.endDate,
		priceSettings: { rule: settings.pricingRule, taxRateBp: settings.taxRateBp, depositBp: settings.depositBp, currency: settings.currency },
		inService,
		reservations: []
	});
	const sentence = limitsSentence(result, request);
	await version.update(
		{ request, evaluation: result, price: result.price, siteId: site.id, site: snapshot, notes: sentence },
		{ transaction }
	);
}

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		const rows = [];
		for (const site of SITES) rows.push(await seedSite(site, transaction));
		await reevaluateFestival(rows[0], transaction);
	});
}
