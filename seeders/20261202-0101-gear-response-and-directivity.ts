/**
 * Kestrel Yard Audio's gear data for the v2 acoustic model (data/gear-response.ts): each demo model's
 * band response, compression and polar table; each demo package's group heights and stack spacing; and
 * a line-array package with cardioid subs. Idempotent: a value is written only where none is stored yet
 * (so the warehouse's own edits stay), and the new package is found or created by slug.
 */
import type { Transaction } from 'sequelize';
import type { StepContext } from '../scripts/migrate';
import { channelPlanErrors } from '../src/lib/inventory/channel-plan';
import { bandResponseSchema, compressionSchema, directivitySchema } from '../src/lib/schemas/directivity';
import { packageGroupSchema } from '../src/lib/schemas/inventory-packages';
import { AmplifierModel, LoudspeakerModel, Package, PackageGroup } from '../src/lib/server/db/models';
import { amplifiers, loudspeakers } from './data/inventory';
import { cardioidPackage, gearByCode, placements } from './data/gear-response';

async function seedModelData(transaction: Transaction): Promise<Map<string, LoudspeakerModel>> {
	const byCode = new Map<string, LoudspeakerModel>();
	for (const [code, gear] of gearByCode) {
		const model = await LoudspeakerModel.findOne({ where: { name: gear.name, maker: gear.maker }, transaction });
		if (!model) throw new Error(`demo model ${code} is missing; run the inventory seeder first`);
		byCode.set(code, model);
		await model.update(
			{
				bandResponseDb: model.bandResponseDb ?? bandResponseSchema.parse(gear.bandResponseDb),
				compressionDb: model.compressionDb ?? compressionSchema.parse(gear.compressionDb),
				directivity: model.directivity ?? directivitySchema.parse(gear.directivity)
			},
			{ transaction }
		);
	}
	return byCode;
}

async function seedPlacements(transaction: Transaction): Promise<void> {
	for (const [slug, groups] of Object.entries(placements)) {
		const pkg = await Package.findOne({ where: { slug }, transaction });
		if (!pkg) continue; // a demo package the company has since deleted
		for (const [position, place] of groups.entries()) {
			const group = await PackageGroup.findOne({ where: { packageId: pkg.id, position }, transaction });
			if (group) await group.update({ heightM: group.heightM ?? place.heightM, spacingM: group.spacingM ?? place.spacingM }, { transaction });
		}
	}
}

async function seedCardioidPackage(speakers: Map<string, LoudspeakerModel>, transaction: Transaction): Promise<void> {
	const amps = new Map<string, AmplifierModel>();
	for (const a of amplifiers) {
		const found = await AmplifierModel.findOne({ where: { name: a.name, maker: a.maker }, transaction });
		if (found) amps.set(a.code, found);
	}
	const { groups, ...fields } = cardioidPackage;
	const planned = groups.map((g) => ({ ...g, loudspeaker: speakers.get(g.speaker)!, amplifier: amps.get(g.amp)! }));
	const problems = channelPlanErrors(planned);
	if (Object.keys(problems).length) throw new Error(`package ${fields.slug}: ${JSON.stringify(problems)}`);
	const [pkg, created] = await Package.findOrCreate({ where: { slug: fields.slug }, defaults: { ...fields, active: true }, transaction });
	if (!created) return;
	await PackageGroup.bulkCreate(
		planned.map((g, position) => ({
			packageId: pkg.id,
			position,
			...packageGroupSchema.parse({ ...g, loudspeakerModelId: g.loudspeaker.id, amplifierModelId: g.amplifier.id })
		})),
		{ transaction }
	);
}

export async function up({ context }: { context: StepContext }) {
	if (loudspeakers.length === 0) return;
	await context.sequelize.transaction(async (transaction) => {
		const speakers = await seedModelData(transaction);
		await seedPlacements(transaction);
		await seedCardioidPackage(speakers, transaction);
	});
}
