/**
 * Kestrel Yard Audio's inventory: loudspeaker and amplifier models, six packages from a speech kit to a
 * flown line array, and stock units with serials. Idempotent: everything is found or created by name,
 * slug or serial, and a package's groups are written only when the package is new.
 */
import type { Transaction } from 'sequelize';
import type { StepContext } from '../scripts/migrate';
import { channelPlanErrors } from '../src/lib/inventory/channel-plan';
import { amplifierSchema } from '../src/lib/schemas/inventory-amplifiers';
import { loudspeakerSchema } from '../src/lib/schemas/inventory-loudspeakers';
import { AmplifierModel, LoudspeakerModel, Package, PackageGroup, StockUnit } from '../src/lib/server/db/models';
import { amplifiers, loudspeakers, packages } from './data/inventory';

const LOCATIONS = ['Bay A racking', 'Bay B racking', 'Cage 2', 'Amp room'];

async function seedUnits(
	code: string,
	stock: number,
	model: { modelType: 'loudspeaker' | 'amplifier'; id: number },
	transaction: Transaction
) {
	for (let n = 1; n <= stock; n++) {
		const serial = `KYA-${code}-${String(n).padStart(3, '0')}`;
		// A few in the repair bench, and the very first of the line-array elements retired.
		const status = code === 'TS12' && n === 1 ? 'retired' : n % 7 === 0 ? 'in-repair' : 'ready';
		await StockUnit.findOrCreate({
			where: { serial },
			defaults: {
				serial,
				modelType: model.modelType,
				loudspeakerModelId: model.modelType === 'loudspeaker' ? model.id : null,
				amplifierModelId: model.modelType === 'amplifier' ? model.id : null,
				status,
				location: LOCATIONS[n % LOCATIONS.length],
				lastTestedAt: status === 'ready' ? `2026-0${1 + (n % 9)}-1${n % 10}` : null,
				notes: status === 'in-repair' ? 'HF driver replacement' : status === 'retired' ? 'Cabinet damaged in transit; kept for parts' : ''
			},
			transaction
		});
	}
}

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		const speakerByCode = new Map<string, LoudspeakerModel>();
		for (const { code, stock, ...fields } of loudspeakers) {
			const values = loudspeakerSchema.parse(fields);
			const [model] = await LoudspeakerModel.findOrCreate({ where: { name: values.name, maker: values.maker }, defaults: values, transaction });
			speakerByCode.set(code, model);
			await seedUnits(code, stock, { modelType: 'loudspeaker', id: model.id }, transaction);
		}
		const ampByCode = new Map<string, AmplifierModel>();
		for (const { code, stock, ...fields } of amplifiers) {
			const values = amplifierSchema.parse(fields);
			const [model] = await AmplifierModel.findOrCreate({ where: { name: values.name, maker: values.maker }, defaults: values, transaction });
			ampByCode.set(code, model);
			await seedUnits(code, stock, { modelType: 'amplifier', id: model.id }, transaction);
		}
		for (const { groups, ...fields } of packages) {
			const planned = groups.map((g) => ({ ...g, loudspeaker: speakerByCode.get(g.speaker)!, amplifier: ampByCode.get(g.amp)! }));
			const problems = channelPlanErrors(planned);
			if (Object.keys(problems).length) throw new Error(`package ${fields.slug}: ${JSON.stringify(problems)}`);
			const [pkg, created] = await Package.findOrCreate({ where: { slug: fields.slug }, defaults: { ...fields, active: true }, transaction });
			if (!created) continue;
			await PackageGroup.bulkCreate(
				planned.map((g, position) => ({
					packageId: pkg.id,
					position,
					loudspeakerModelId: g.loudspeaker.id,
					amplifierModelId: g.amplifier.id,
					count: g.count,
					stacks: g.stacks,
					cabinetsPerChannel: g.cabinetsPerChannel,
					flown: g.flown ?? false
				})),
				{ transaction }
			);
		}
	});
}
