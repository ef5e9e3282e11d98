/** A composed or suggested system, by model ids, loaded as a package the quoting engine evaluates. */
import { channelPlanErrors, type LoadedGroup, type LoadedPackage } from '$lib/inventory';
import type { SystemInput } from '$lib/schemas/systems';
import { systemName } from '$lib/systems/present';
import { AmplifierModel, LoudspeakerModel } from '../db/models';
import { plainRow } from './inventory-common';
import { DomainError } from './errors';

// Common practice: ground-stacked subwoofers ~0.6 m, tops on stands ~2.5 m, flown hangs ~7 m.
const DEFAULT_HEIGHT_M: Record<string, number> = { subwoofer: 0.6, 'full-range': 2.5, 'line-array-element': 7, monitor: 1.5 };

export async function loadSystem(system: SystemInput): Promise<LoadedPackage> {
	const speakerIds = [...new Set(system.groups.map((g) => g.loudspeakerModelId))];
	const ampIds = [...new Set(system.groups.map((g) => g.amplifierModelId))];
	const [speakers, amps] = await Promise.all([
		LoudspeakerModel.findAll({ where: { id: speakerIds } }),
		AmplifierModel.findAll({ where: { id: ampIds } })
	]);
	const speakerById = new Map(speakers.map((s) => [s.id, plainRow<LoadedGroup['loudspeaker']>(s)]));
	const ampById = new Map(amps.map((a) => [a.id, plainRow<LoadedGroup['amplifier']>(a)]));
	const errors: Record<string, string[]> = {};
	system.groups.forEach((g, i) => {
		if (!speakerById.has(g.loudspeakerModelId)) errors[`system.groups.${i}.loudspeakerModelId`] = ['Choose a loudspeaker model in the inventory'];
		if (!ampById.has(g.amplifierModelId)) errors[`system.groups.${i}.amplifierModelId`] = ['Choose an amplifier model in the inventory'];
	});
	if (Object.keys(errors).length > 0) throw new DomainError(422, 'The system names models that are not in the inventory.', errors);
	const groups: LoadedGroup[] = system.groups.map((g, position) => {
		const loudspeaker = speakerById.get(g.loudspeakerModelId)!;
		return {
			id: -(position + 1),
			position,
			loudspeakerModelId: g.loudspeakerModelId,
			count: g.count,
			stacks: g.stacks,
			amplifierModelId: g.amplifierModelId,
			cabinetsPerChannel: g.cabinetsPerChannel,
			flown: g.flown ?? loudspeaker.kind === 'line-array-element',
			heightM: g.heightM ?? DEFAULT_HEIGHT_M[loudspeaker.kind] ?? 1.5,
			spacingM: g.spacingM ?? null,
			directivity: g.directivity ?? null,
			loudspeaker,
			amplifier: ampById.get(g.amplifierModelId)!
		};
	});
	const plan = channelPlanErrors(groups);
	if (Object.keys(plan).length > 0) {
		throw new DomainError(422, 'The system’s channel plan does not work.', Object.fromEntries(Object.entries(plan).map(([k, v]) => [`system.${k}`, v])));
	}
	return { id: 0, name: systemName(groups), slug: 'system', description: 'Composed for this quote', active: true, createdAt: '', updatedAt: '', groups };
}
