import type { LoadedGroup } from './types';

export interface BillLine {
	modelId: number;
	name: string;
	maker: string;
	count: number;
}

export interface AmplifierBillLine extends BillLine {
	/** Channels the package's groups use on this model (the amplifiers may have spare ones). */
	channelsUsed: number;
}

export interface FlownHang {
	/** Index of the group in package order. */
	group: number;
	loudspeakerName: string;
	hangs: number;
	cabinetsPerHang: number;
	/** Cabinet weight only: frames, motors and cable come on top (see the rigging caution). */
	loadKg: number;
}

export interface BillOfMaterials {
	loudspeakers: BillLine[];
	amplifiers: AmplifierBillLine[];
	totalWeightKg: number;
	totalDayRateMinor: number;
	/** Sum of the amplifiers' mains current at 1/8 power, for generator sizing. */
	mainsCurrentAmps: number;
	flownHangs: FlownHang[];
}

/** Amplifier channels one group needs: each stack is wired on its own channels. */
export function channelsNeeded(group: Pick<LoadedGroup, 'count' | 'stacks' | 'cabinetsPerChannel'>): number {
	return group.stacks * Math.ceil(group.count / group.cabinetsPerChannel);
}

/**
 * What goes out of the warehouse for a package: cabinets per loudspeaker model; amplifiers per model
 * (ceil of the channels all groups on that model need over its channel count, so groups share
 * amplifiers); total weight and day rate of cabinets plus amplifiers; mains current at 1/8 power;
 * and the cabinet load of each flown hang.
 */
export function packageBillOfMaterials(groups: readonly LoadedGroup[]): BillOfMaterials {
	const speakers = new Map<number, BillLine>();
	const amps = new Map<number, AmplifierBillLine & { channels: number }>();
	const flownHangs: FlownHang[] = [];
	let weight = 0;
	let dayRate = 0;

	[...groups]
		.sort((a, b) => a.position - b.position)
		.forEach((g, index) => {
			const cabinets = g.count * g.stacks;
			const line = speakers.get(g.loudspeaker.id) ?? { modelId: g.loudspeaker.id, name: g.loudspeaker.name, maker: g.loudspeaker.maker, count: 0 };
			line.count += cabinets;
			speakers.set(g.loudspeaker.id, line);
			weight += cabinets * g.loudspeaker.weightKg;
			dayRate += cabinets * g.loudspeaker.dayRateMinor;

			const amp = amps.get(g.amplifier.id) ?? { modelId: g.amplifier.id, name: g.amplifier.name, maker: g.amplifier.maker, count: 0, channelsUsed: 0, channels: g.amplifier.channels };
			amp.channelsUsed += channelsNeeded(g);
			amps.set(g.amplifier.id, amp);

			if (g.flown) {
				flownHangs.push({ group: index, loudspeakerName: g.loudspeaker.name, hangs: g.stacks, cabinetsPerHang: g.count, loadKg: round(g.count * g.loudspeaker.weightKg) });
			}
		});

	let mains = 0;
	const ampById = new Map(groups.map((g) => [g.amplifier.id, g.amplifier]));
	const amplifiers = [...amps.values()].map(({ channels, ...line }) => {
		const model = ampById.get(line.modelId)!;
		const count = Math.ceil(line.channelsUsed / channels);
		weight += count * model.weightKg;
		dayRate += count * model.dayRateMinor;
		mains += count * model.mainsCurrentAmps;
		return { ...line, count };
	});

	return {
		loudspeakers: [...speakers.values()],
		amplifiers,
		totalWeightKg: round(weight),
		totalDayRateMinor: dayRate,
		mainsCurrentAmps: round(mains),
		flownHangs
	};
}

/** Two decimals hide floating-point dust (0.1 + 0.2) without losing anything a technician reads. */
function round(value: number): number {
	return Math.round(value * 100) / 100;
}
