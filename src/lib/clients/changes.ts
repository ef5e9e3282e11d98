/** What an edit to a client record changed, field by field, for its history. Pure. */
export interface FieldChange {
	field: string;
	oldValue: string | null;
	newValue: string | null;
}

const normalise = (value: unknown): string | null => {
	if (value === undefined || value === null) return null;
	const text = String(value).trim();
	return text === '' ? null : text;
};

/** The fields of `next` whose value differs from `current` (empty and missing count as the same). */
export function changedFields(current: Record<string, unknown>, next: Record<string, unknown>): FieldChange[] {
	const changes: FieldChange[] = [];
	for (const [field, value] of Object.entries(next)) {
		if (value === undefined) continue;
		const oldValue = normalise(current[field]);
		const newValue = normalise(value);
		if (oldValue !== newValue) changes.push({ field, oldValue, newValue });
	}
	return changes;
}

/** Narrows a search text to a LIKE pattern with its wildcards escaped; null when there is nothing to find. */
export function likePattern(query: string | null | undefined): string | null {
	const text = (query ?? '').trim().slice(0, 100);
	if (!text) return null;
	return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
