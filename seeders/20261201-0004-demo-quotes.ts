/**
 * Three invented quotes for the demo, one per client: a festival quote sent and awaiting acceptance, a
 * school graduation already paid and booked, and a club night still in draft. Each is evaluated and
 * priced by the same pure code the desk uses, so the numbers on screen are real model output.
 * Idempotent: a quote is created only when its client has none with that event name.
 */
import type { Transaction } from 'sequelize';
import type { StepContext } from '../scripts/migrate';
import { evaluatePackages, type PackageResult } from '../src/lib/quotes/evaluate-packages';
import type { LoadedPackage } from '../src/lib/inventory/types';
import { toModelRequest } from '../src/lib/quotes/request';
import type { QuoteRequestInput } from '../src/lib/schemas/evaluation';
import {
	AmplifierModel, Booking, BookingLine, Client, CompanySettings, Invoice, LoudspeakerModel, Package, PackageGroup,
	ProgrammeProfile, Quote, QuoteVersion, StockUnit, User
} from '../src/lib/server/db/models';
import { depositAmounts } from '../src/lib/quotes/invoice-split';

type Demo = { client: string; eventName: string; packageSlug: string; status: 'draft' | 'sent' | 'confirmed'; request: QuoteRequestInput };

const demos: Demo[] = [
	{
		client: 'organiser@millbrook-riverside.test', eventName: 'Riverside food festival, main stage', packageSlug: 'line-array-large', status: 'sent',
		request: { targetDb: 98, weighting: 'A', distance: 35, distanceUnit: 'm', audienceWidth: 60, programme: 'pop-rock', temperatureC: 18, humidityPct: 60, startDate: '2027-06-12', endDate: '2027-06-13', boundary: { distance: 320, limitDb: 65, weighting: 'C' } }
	},
	{
		client: 'events@st-aldric.test', eventName: 'Graduation ceremony on the lawn', packageSlug: 'acoustic-stage', status: 'confirmed',
		request: { targetDb: 84, weighting: 'A', distance: 20, distanceUnit: 'm', audienceWidth: 30, programme: 'speech', temperatureC: 20, humidityPct: 50, startDate: '2027-07-09', endDate: '2027-07-09' }
	},
	{
		client: 'bookings@lowtide-club.test', eventName: 'Low Tide warehouse night', packageSlug: 'club-rig', status: 'draft',
		request: { targetDb: 104, weighting: 'C', distance: 12, distanceUnit: 'm', programme: 'dance', temperatureC: 22, humidityPct: 45, startDate: '2027-05-22', endDate: '2027-05-23' }
	}
];

async function loadPackage(slug: string, transaction: Transaction): Promise<LoadedPackage> {
	const pkg = await Package.findOne({
		where: { slug },
		include: [{ model: PackageGroup, as: 'groups', include: [{ model: LoudspeakerModel, as: 'loudspeaker' }, { model: AmplifierModel, as: 'amplifier' }] }],
		transaction
	});
	if (!pkg) throw new Error(`demo package ${slug} is missing; run the inventory seeder first`);
	return pkg.get({ plain: true }) as unknown as LoadedPackage;
}

async function evaluate(demo: Demo, transaction: Transaction): Promise<PackageResult> {
	const settings = (await CompanySettings.findByPk(1, { transaction }))!;
	const programme = (await ProgrammeProfile.findOne({ where: { slug: demo.request.programme }, transaction }))!;
	const bandsDb = Object.fromEntries(Object.entries(programme.bands).map(([band, level]) => [Number(band), level]));
	const units = await StockUnit.findAll({ where: { status: 'ready' }, transaction });
	const inService: Record<string, number> = {};
	for (const u of units) {
		const key = `${u.modelType}:${u.loudspeakerModelId ?? u.amplifierModelId}`;
		inService[key] = (inService[key] ?? 0) + 1;
	}
	const [result] = evaluatePackages([await loadPackage(demo.packageSlug, transaction)], {
		request: toModelRequest(demo.request, { bandsDb, crestFactorDb: programme.crestFactorDb }, settings.defaultMarginDb),
		startDate: demo.request.startDate,
		endDate: demo.request.endDate,
		priceSettings: { rule: settings.pricingRule, taxRateBp: settings.taxRateBp, depositBp: settings.depositBp, currency: settings.currency },
		inService,
		reservations: []
	});
	return result;
}

async function seedOne(demo: Demo, deskUserId: number, transaction: Transaction) {
	const client = await Client.findOne({ where: { email: demo.client }, transaction });
	if (!client || (await Quote.findOne({ where: { clientId: client.id, eventName: demo.eventName }, transaction }))) return;
	const result = await evaluate(demo, transaction);
	const now = new Date();
	const quote = await Quote.create(
		{ clientId: client.id, eventName: demo.eventName, createdById: deskUserId, status: demo.status, ...(demo.status !== 'draft' ? { sentAt: now } : {}), ...(demo.status === 'confirmed' ? { acceptedAt: now } : {}) },
		{ transaction }
	);
	await QuoteVersion.create(
		{ quoteId: quote.id, version: 1, packageId: result.packageId, startDate: demo.request.startDate, endDate: demo.request.endDate, request: demo.request, evaluation: result, price: result.price, notes: null, createdById: deskUserId },
		{ transaction }
	);
	if (demo.status !== 'confirmed') return;
	const deposit = depositAmounts(result.price);
	await Invoice.create(
		{ quoteId: quote.id, kind: 'deposit', stripeInvoiceId: `in_demo_${quote.id}`, number: `DEMO-${quote.id}`, status: 'paid', amountMinor: deposit.amountMinor, taxMinor: deposit.taxMinor, currency: result.price.currency, hostedUrl: null, paidAt: now },
		{ transaction }
	);
	const booking = await Booking.create({ quoteId: quote.id, status: 'confirmed', startDate: demo.request.startDate, endDate: demo.request.endDate }, { transaction });
	const lines = [
		...result.billOfMaterials.loudspeakers.map((l) => ({ modelType: 'loudspeaker' as const, modelId: l.modelId, quantity: l.count })),
		...result.billOfMaterials.amplifiers.map((a) => ({ modelType: 'amplifier' as const, modelId: a.modelId, quantity: a.count }))
	];
	await BookingLine.bulkCreate(lines.map((l) => ({ ...l, bookingId: booking.id })), { transaction });
}

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		const desk = await User.findOne({ where: { email: 'sales@kestrel-yard.test' }, transaction });
		if (!desk) return;
		for (const demo of demos) await seedOne(demo, desk.id, transaction);
	});
}
