import type { DirectivityTable } from '$lib/schemas/directivity';
import type { AmplifierInput } from '$lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '$lib/schemas/inventory-loudspeakers';
import type { StockUnitStatus } from '$lib/schemas/inventory-units';

/** Plain rows as the inventory services return them (dates as ISO strings). */
interface Stamped {
	id: number;
	createdAt: string;
	updatedAt: string;
}

export type LoudspeakerModelRow = LoudspeakerInput & Stamped;
export type AmplifierModelRow = AmplifierInput & Stamped;

export interface PackageGroupRow {
	id: number;
	position: number;
	loudspeakerModelId: number;
	count: number;
	stacks: number;
	amplifierModelId: number;
	cabinetsPerChannel: number;
	flown: boolean;
	/** v2 placement; optional so rows made before it (and fixtures) still fit. */
	heightM?: number | null;
	spacingM?: number | null;
	directivity?: DirectivityTable | null;
}

export interface PackageRow extends Stamped {
	name: string;
	slug: string;
	description: string;
	active: boolean;
	groups: PackageGroupRow[];
}

/** A group with its two models loaded: what the mapping and the bill of materials need. */
export type LoadedGroup = PackageGroupRow & { loudspeaker: LoudspeakerModelRow; amplifier: AmplifierModelRow };
export type LoadedPackage = Omit<PackageRow, 'groups'> & { groups: LoadedGroup[] };

export interface StockUnitRow extends Stamped {
	serial: string;
	modelType: ModelType;
	modelId: number;
	modelName: string;
	status: StockUnitStatus;
	location: string;
	lastTestedAt: string | null;
	notes: string;
}

/** Which kind of model a stock unit, booking line or attachment belongs to. */
export type ModelType = 'loudspeaker' | 'amplifier';

export type HistoryModelType = ModelType | 'package' | 'unit';

export interface HistoryEntryRow {
	id: number;
	field: string;
	oldValue: string | null;
	newValue: string | null;
	userId: number | null;
	userName: string | null;
	createdAt: string;
}

export interface AttachmentRow {
	id: number;
	modelType: ModelType;
	modelId: number;
	kind: 'spec-sheet' | 'photo';
	originalName: string;
	mimeType: string;
	sizeBytes: number;
	uploadedBy: number | null;
	createdAt: string;
}
