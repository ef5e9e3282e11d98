import type { AmplifierSpec, Directivity, GroupSpec, LoudspeakerSpec, NominalBandHz, PackageSpec } from '$lib/acoustics';
import type { BandResponse, DirectivityTable } from '$lib/schemas/directivity';
import type { AmplifierInput } from '$lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '$lib/schemas/inventory-loudspeakers';
import type { LoadedPackage } from './types';

/** Keeps only the values a maker actually published: the model treats an absent field as "not given". */
function given<K extends string>(key: K, value: number | null | undefined): { [P in K]?: number } {
	return (value == null ? {} : { [key]: value }) as { [P in K]?: number };
}

/** Stored band keys ("31.5", "63", …) as the model's numeric bands; an absent or empty record stays absent. */
function bandRecord<T>(stored: Partial<Record<string, T>> | null | undefined): Partial<Record<NominalBandHz, T>> | undefined {
	if (!stored) return undefined;
	const entries = Object.entries(stored).filter(([, v]) => v != null);
	if (entries.length === 0) return undefined;
	return Object.fromEntries(entries.map(([band, v]) => [Number(band), v])) as Partial<Record<NominalBandHz, T>>;
}

/** A stored directivity table as the model's Directivity, or absent when none was entered. */
export function toDirectivity(table: DirectivityTable | null | undefined): Directivity | undefined {
	const bandsDb = bandRecord<number[]>(table?.bandsDb);
	return table && bandsDb ? { anglesDeg: [...table.anglesDeg], bandsDb } : undefined;
}

function optionalPart<K extends string, V>(key: K, value: V | undefined): { [P in K]?: V } {
	return (value === undefined ? {} : { [key]: value }) as { [P in K]?: V };
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
		...given('heightM', row.heightM),
		...optionalPart('bandResponseDb', bandRecord<number>(row.bandResponseDb as BandResponse | null | undefined)),
		...given('compressionDb', row.compressionDb),
		...optionalPart('directivity', toDirectivity(row.directivity))
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
					cabinetsPerChannel: g.cabinetsPerChannel,
					...given('heightM', g.heightM),
					...given('spacingM', g.spacingM),
					...optionalPart('directivity', toDirectivity(g.directivity))
				})
			)
	};
}
