/**
 * The search space of a suggestion, as chains: a chain fixes everything about a group but its
 * cabinet count (model, stacks, amplifier, cabinets per channel). Along a chain more cabinets never
 * lower capability, so a chain is searched with counts ascending and stops when clear.
 */
import { channelPlanErrors, channelsNeeded, type AmplifierModelRow, type LoadedGroup, type LoudspeakerModelRow } from '../inventory';
import type { ModelKey } from '../quotes/availability';
import type { ModelType } from '../inventory/types';

export interface StockCatalogue {
	loudspeakers: LoudspeakerModelRow[];
	amplifiers: AmplifierModelRow[];
	/** Units free on the hire dates, per model. */
	available: Partial<Record<ModelKey, number>>;
}

export interface Chain {
	role: 'main' | 'sub';
	loudspeaker: LoudspeakerModelRow;
	amplifier: AmplifierModelRow;
	stacks: 1 | 2;
	cabinetsPerChannel: number;
	/** Fewest and most cabinets per stack the stock allows on this chain. */
	minCount: number;
	maxCount: number;
	/** Day cost of the chain's smallest system on its own, minor units. */
	minDayCost: number;
}

// Common practice: ground-stacked subwoofers ~0.6 m, tops on stands ~2.5 m, flown hangs ~7 m.
const HEIGHT_M = { subwoofer: 0.6, 'full-range': 2.5, 'line-array-element': 7 } as const;

export function freeUnits(catalogue: StockCatalogue, type: ModelType, id: number): number {
	return Math.max(0, catalogue.available[`${type}:${id}`] ?? 0);
}

/** A chain's group with `count` cabinets per stack, as a package group with its models loaded. */
export function groupOf(chain: Chain, count: number, position: number): LoadedGroup {
	const kind = chain.loudspeaker.kind as keyof typeof HEIGHT_M;
	return {
		id: -(position + 1),
		position,
		loudspeakerModelId: chain.loudspeaker.id,
		count,
		stacks: chain.stacks,
		amplifierModelId: chain.amplifier.id,
		cabinetsPerChannel: chain.cabinetsPerChannel,
		flown: kind === 'line-array-element',
		heightM: HEIGHT_M[kind] ?? 1.5,
		spacingM: null,
		loudspeaker: chain.loudspeaker,
		amplifier: chain.amplifier
	};
}

function amplifiersFor(chain: Pick<Chain, 'amplifier'>, channels: number): number {
	return Math.ceil(channels / chain.amplifier.channels);
}

/** Every chain of one role the stock can build, deterministic order (model id, stacks, amp id, cpc). */
export function chainsOf(catalogue: StockCatalogue, role: 'main' | 'sub'): Chain[] {
	const kinds = role === 'main' ? ['full-range', 'line-array-element'] : ['subwoofer'];
	const speakers = catalogue.loudspeakers.filter((l) => kinds.includes(l.kind)).sort((a, b) => a.id - b.id);
	const amps = [...catalogue.amplifiers].sort((a, b) => a.id - b.id);
	const chains: Chain[] = [];
	for (const loudspeaker of speakers) {
		const cabinets = freeUnits(catalogue, 'loudspeaker', loudspeaker.id);
		for (const stacks of [1, 2] as const) {
			const maxBySpeakers = Math.floor(cabinets / stacks);
			if (maxBySpeakers < 1) continue;
			for (const amplifier of amps) {
				const ampsFree = freeUnits(catalogue, 'amplifier', amplifier.id);
				if (ampsFree < 1 || amplifier.channels < 1) continue;
				for (let cabinetsPerChannel = 1; cabinetsPerChannel <= maxBySpeakers; cabinetsPerChannel++) {
					const plan = { count: cabinetsPerChannel, cabinetsPerChannel, loudspeaker, amplifier };
					if (Object.keys(channelPlanErrors([plan])).length > 0) break; // lower loads only get worse
					let maxCount = maxBySpeakers;
					while (maxCount >= cabinetsPerChannel && amplifiersFor({ amplifier }, channelsNeeded({ count: maxCount, stacks, cabinetsPerChannel })) > ampsFree) maxCount--;
					if (maxCount < cabinetsPerChannel) continue;
					const chain: Chain = { role, loudspeaker, amplifier, stacks, cabinetsPerChannel, minCount: cabinetsPerChannel, maxCount, minDayCost: 0 };
					chain.minDayCost = dayCost([groupOf(chain, chain.minCount, 0)]);
					chains.push(chain);
				}
			}
		}
	}
	return chains.sort((a, b) => a.minDayCost - b.minDayCost);
}

/** Cabinets plus amplifiers (groups on one amplifier model share them) for one hire day, minor units. */
export function dayCost(groups: readonly LoadedGroup[]): number {
	let cost = 0;
	const channels = new Map<number, { rate: number; per: number; used: number }>();
	for (const g of groups) {
		cost += g.count * g.stacks * g.loudspeaker.dayRateMinor;
		const a = channels.get(g.amplifier.id) ?? { rate: g.amplifier.dayRateMinor, per: g.amplifier.channels, used: 0 };
		a.used += channelsNeeded(g);
		channels.set(g.amplifier.id, a);
	}
	for (const a of channels.values()) cost += Math.ceil(a.used / a.per) * a.rate;
	return cost;
}

/** Units of each model the groups take, against what is free: the models that run out. */
export function unitsOverStock(groups: readonly LoadedGroup[], catalogue: StockCatalogue): ModelKey[] {
	const need = new Map<ModelKey, number>();
	const ampChannels = new Map<number, { per: number; used: number }>();
	for (const g of groups) {
		const key: ModelKey = `loudspeaker:${g.loudspeaker.id}`;
		need.set(key, (need.get(key) ?? 0) + g.count * g.stacks);
		const a = ampChannels.get(g.amplifier.id) ?? { per: g.amplifier.channels, used: 0 };
		a.used += channelsNeeded(g);
		ampChannels.set(g.amplifier.id, a);
	}
	for (const [id, a] of ampChannels) need.set(`amplifier:${id}`, Math.ceil(a.used / a.per));
	return [...need].filter(([key, n]) => n > (catalogue.available[key] ?? 0)).map(([key]) => key);
}
