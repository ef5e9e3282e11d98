import type { AmplifierSpec, GroupSpec, LoudspeakerSpec, PackageSpec } from '$lib/acoustics';
import type { AmplifierInput } from '$lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '$lib/schemas/inventory-loudspeakers';
import type { LoadedPackage } from './types';

/** Keeps only the values a maker actually published: the model treats an absent field as "not given". */
function given<K extends string>(key: K, value: number | null | undefined): { [P in K]?: number } {
	return (value == null ? {} : { [key]: value }) as { [P in K]?: number };
}

/** A stored loudspeaker model as the acoustic model's LoudspeakerSpec (nulls become absent fields). */
export function toLoudspeakerSpec(row: LoudspeakerInput): LoudspeakerSpec {
	return {
		kind: row.kind,
		sensitivityDb: row.sensitivityDb,
		sensitivityRef: row.sensitivityRef,
		impedanceOhm: row.impedanceOhm,
		powerContinuousW: row.powerContinuousW,
		...given('powerPeakW', row.powerPeakW),
		...given('maxSplContinuousDb', row.maxSplContinuousDb),
		...given('maxSplPeakDb', row.maxSplPeakDb),
		dispersionHDeg: row.dispersionHDeg,
		dispersionVDeg: row.dispersionVDeg,
		lowHz: row.lowHz,
		highHz: row.highHz,
		...given('heightM', row.heightM)
	};
}

/** A stored amplifier model as an AmplifierSpec: the three rated powers become powerW {8, 4, 2}. */
export function toAmplifierSpec(row: AmplifierInput): AmplifierSpec {
	const powerW: AmplifierSpec['powerW'] = {};
	if (row.powerW8 != null) powerW[8] = row.powerW8;
	if (row.powerW4 != null) powerW[4] = row.powerW4;
	if (row.powerW2 != null) powerW[2] = row.powerW2;
	return { channels: row.channels, powerW, minLoadOhm: row.minLoadOhm };
}

/** A package with its groups and models loaded, as the PackageSpec `evaluatePackage` takes. */
export function toPackageSpec(pkg: Pick<LoadedPackage, 'groups'>): PackageSpec {
	return {
		groups: [...pkg.groups]
			.sort((a, b) => a.position - b.position)
			.map(
				(g): GroupSpec => ({
					loudspeaker: toLoudspeakerSpec(g.loudspeaker),
					count: g.count,
					stacks: g.stacks,
					amplifier: toAmplifierSpec(g.amplifier),
					cabinetsPerChannel: g.cabinetsPerChannel
				})
			)
	};
}
