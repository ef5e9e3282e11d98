/**
 * Amplifier counts. Channels per group = stacks · ceil(count / cabinetsPerChannel): a channel
 * drives cabinets of one stack only. Amplifiers are counted per amplifier model, where two groups
 * use the same model when their AmplifierSpec values are identical (channels, power ratings,
 * minimum load) — by value, not by object reference, because specs arrive as JSON. Groups on the
 * same model pool their channels: amplifiers = ceil(channels / amp.channels) per model, summed.
 */
import type { AmplifierSpec, GroupSpec } from './types';

export function groupChannels(
	group: Pick<GroupSpec, 'count' | 'stacks' | 'cabinetsPerChannel'>
): number {
	return (group.stacks ?? 1) * Math.ceil(group.count / group.cabinetsPerChannel);
}

/** Value identity of an amplifier model. */
export function amplifierModelKey(amp: AmplifierSpec): string {
	return `${amp.channels}|${amp.powerW[8] ?? '-'}|${amp.powerW[4] ?? '-'}|${amp.powerW[2] ?? '-'}|${amp.minLoadOhm}`;
}

export function amplifierNeeds(groups: readonly GroupSpec[]): {
	amplifierChannelsNeeded: number;
	amplifiersNeeded: number;
} {
	let amplifierChannelsNeeded = 0;
	const channelsByModel = new Map<string, { channels: number; perAmplifier: number }>();
	for (const group of groups) {
		const channels = groupChannels(group);
		amplifierChannelsNeeded += channels;
		const key = amplifierModelKey(group.amplifier);
		const entry = channelsByModel.get(key);
		if (entry) entry.channels += channels;
		else channelsByModel.set(key, { channels, perAmplifier: group.amplifier.channels });
	}
	let amplifiersNeeded = 0;
	for (const { channels, perAmplifier } of channelsByModel.values())
		amplifiersNeeded += Math.ceil(channels / perAmplifier);
	return { amplifierChannelsNeeded, amplifiersNeeded };
}
