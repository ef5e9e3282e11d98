import type { AmplifierInput } from '$lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '$lib/schemas/inventory-loudspeakers';

export interface PlannedGroup {
	count: number;
	cabinetsPerChannel: number;
	loudspeaker: Pick<LoudspeakerInput, 'impedanceOhm' | 'name'>;
	amplifier: Pick<AmplifierInput, 'minLoadOhm' | 'name' | 'channels'>;
}

/** The load one channel sees: the cabinets on it wired in parallel. */
export function channelLoadOhm(group: Pick<PlannedGroup, 'cabinetsPerChannel' | 'loudspeaker'>): number {
	return group.loudspeaker.impedanceOhm / group.cabinetsPerChannel;
}

/**
 * Field errors of a package's channel plan, keyed like the form (`groups.1.cabinetsPerChannel`).
 * A channel carries cabinets of one stack only (so at most `count`), and the parallel load must stay
 * at or above the amplifier's minimum load — the acoustic model refuses anything lower. The number of
 * amplifiers follows from the channels needed, so there are always enough channels.
 */
export function channelPlanErrors(groups: readonly PlannedGroup[]): Record<string, string[]> {
	const errors: Record<string, string[]> = {};
	groups.forEach((g, i) => {
		const key = `groups.${i}.cabinetsPerChannel`;
		if (g.amplifier.channels < 1) (errors[`groups.${i}.amplifierModelId`] ??= []).push('This amplifier has no channels');
		if (g.cabinetsPerChannel > g.count) (errors[key] ??= []).push('More cabinets per channel than the group has');
		const load = channelLoadOhm(g);
		if (load < g.amplifier.minLoadOhm) {
			(errors[key] ??= []).push(
				`${g.cabinetsPerChannel} × ${g.loudspeaker.impedanceOhm} Ω in parallel is ${round(load)} Ω, below the ${g.amplifier.minLoadOhm} Ω minimum of ${g.amplifier.name}`
			);
		}
	});
	return errors;
}

function round(value: number): number {
	return Math.round(value * 100) / 100;
}
