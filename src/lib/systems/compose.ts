import type { DirectivityTable } from '$lib/schemas/directivity';

/**
 * The composer's groups: a composed system as the desk edits it, from nothing, a package or a
 * suggestion, and back into the `system` body the API takes. Pure.
 */
export interface ComposedGroup {
	/** 0 until the desk chooses one; the API answers "Choose one" for it. */
	loudspeakerModelId: number;
	count: number;
	stacks: number;
	amplifierModelId: number;
	cabinetsPerChannel: number;
	/** Empty means the model's usual height (subs low, tops on stands, line arrays flown). */
	heightM: number | null;
	spacingM: number | null;
	flown?: boolean;
	/** A group pattern taken over from a package or a suggestion; the composer does not edit it. */
	directivity?: DirectivityTable;
}

/** What the composer chooses from (the request page's options). */
export interface ComposerCatalogue {
	loudspeakers: { id: number; name: string; kind: string; impedanceOhm: number }[];
	amplifiers: { id: number; name: string; channels: number; minLoadOhm: number }[];
	/** Each active package's groups, to start from. */
	packages: { id: number; groups: ComposedGroup[] }[];
}

type GroupLike = Partial<Omit<ComposedGroup, 'heightM' | 'spacingM' | 'directivity'>> & {
	heightM?: number | null;
	spacingM?: number | null;
	directivity?: DirectivityTable | null;
};

/** The composer's fields the API knows, for the group settings that the desk may edit by hand. */
export const COMPOSED_FIELDS = ['loudspeakerModelId', 'count', 'stacks', 'amplifierModelId', 'cabinetsPerChannel', 'heightM', 'spacingM'] as const;
export type ComposedField = (typeof COMPOSED_FIELDS)[number];

export function emptyGroup(): ComposedGroup {
	return { loudspeakerModelId: 0, count: 2, stacks: 1, amplifierModelId: 0, cabinetsPerChannel: 1, heightM: null, spacingM: null };
}

/** A package's or a suggestion's groups as the composer's starting point (own copies, never shared). */
export function composedFrom(groups: readonly GroupLike[]): ComposedGroup[] {
	return groups.map((g) => ({
		loudspeakerModelId: g.loudspeakerModelId ?? 0,
		count: g.count ?? 1,
		stacks: g.stacks ?? 1,
		amplifierModelId: g.amplifierModelId ?? 0,
		cabinetsPerChannel: g.cabinetsPerChannel ?? 1,
		heightM: g.heightM ?? null,
		spacingM: g.spacingM ?? null,
		...(g.flown !== undefined ? { flown: g.flown } : {}),
		...(g.directivity ? { directivity: g.directivity } : {})
	}));
}

/**
 * One field of a group edited by hand. A group pattern belongs to its loudspeaker model, so choosing
 * another model leaves the pattern behind.
 */
export function editedGroup(group: ComposedGroup, field: ComposedField, value: number | null): ComposedGroup {
	const edited = { ...group, [field]: value };
	if (field === 'loudspeakerModelId' && value !== group.loudspeakerModelId) delete edited.directivity;
	return edited;
}

/** The `system` body for POST /api/evaluations and the quote (empty placement left out). */
export function composedSystem(groups: readonly ComposedGroup[]): { groups: Record<string, unknown>[] } {
	return {
		groups: groups.map((g) => ({
			loudspeakerModelId: g.loudspeakerModelId,
			count: g.count,
			stacks: g.stacks,
			amplifierModelId: g.amplifierModelId,
			cabinetsPerChannel: g.cabinetsPerChannel,
			...(g.heightM != null ? { heightM: g.heightM } : {}),
			...(g.spacingM != null ? { spacingM: g.spacingM } : {}),
			...(g.flown !== undefined ? { flown: g.flown } : {}),
			...(g.directivity ? { directivity: g.directivity } : {})
		}))
	};
}

/** A saved system (the request form's hidden field) back into groups; null when it is not one. */
export function composedFromFormValue(text: string): ComposedGroup[] | null {
	if (!text) return null;
	try {
		const parsed = JSON.parse(text) as { groups?: unknown };
		return Array.isArray(parsed.groups) && parsed.groups.length > 0 ? composedFrom(parsed.groups as GroupLike[]) : null;
	} catch {
		return null;
	}
}

/** The API's error for one composer field (`system.groups.1.count`), if any. */
export function composedError(errors: Record<string, string[]>, index: number, field: ComposedField): string | undefined {
	return errors[`system.groups.${index}.${field}`]?.[0];
}

/** Errors on the system as a whole (too many groups, none at all) rather than on one field. */
export function systemWideErrors(errors: Record<string, string[]>): string[] {
	return Object.entries(errors)
		.filter(([path]) => path === 'system' || path === 'system.groups')
		.flatMap(([, messages]) => messages);
}
