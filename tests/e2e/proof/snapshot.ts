/**
 * What the key tables hold, read through the API as the admin: row counts and a checksum of each
 * list, so "nothing changed" can be asserted after a run of hostile requests.
 */
import { createHash } from 'node:crypto';
import { api } from '../http';

export const SNAPSHOT_LISTS = [
	'/api/loudspeakers',
	'/api/amplifiers',
	'/api/packages',
	'/api/stock-units',
	'/api/users',
	'/api/quotes',
	'/api/sites'
] as const;

/** Moves with every sign-in (by anyone sharing the test world), not with the data. */
const VOLATILE_FIELDS = new Set(['lastSignInAt']);

export type Snapshot = Record<string, { rows: number; checksum: string; ids: number[] }>;

/** Stable JSON: keys sorted, so the checksum does not depend on property order. */
function canonical(value: unknown): string {
	if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
	if (value && typeof value === 'object') {
		const entries = Object.entries(value as Record<string, unknown>)
			.filter(([k]) => !VOLATILE_FIELDS.has(k))
			.sort(([a], [b]) => a.localeCompare(b));
		return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
	}
	return JSON.stringify(value) ?? 'null';
}

export async function snapshot(adminCookie: string): Promise<Snapshot> {
	const result: Snapshot = {};
	for (const list of SNAPSHOT_LISTS) {
		const { status, json } = await api(list, { cookie: adminCookie });
		if (status !== 200 || !Array.isArray(json)) throw new Error(`${list} answered ${status}`);
		const rows = [...(json as { id: number }[])].sort((a, b) => a.id - b.id);
		result[list] = {
			rows: rows.length,
			checksum: createHash('sha256').update(canonical(rows)).digest('hex'),
			ids: rows.map((r) => r.id)
		};
	}
	return result;
}

/** Per list: rows added, rows gone, or the same ids with different contents. */
export function differences(before: Snapshot, after: Snapshot): string[] {
	const out: string[] = [];
	for (const list of SNAPSHOT_LISTS) {
		const a = before[list];
		const b = after[list];
		if (a.checksum === b.checksum) continue;
		const added = b.ids.filter((id) => !a.ids.includes(id));
		const gone = a.ids.filter((id) => !b.ids.includes(id));
		out.push(
			`${list}: ${a.rows} → ${b.rows} rows; added ${JSON.stringify(added)}, gone ${JSON.stringify(gone)}${added.length + gone.length === 0 ? ', contents changed' : ''}`
		);
	}
	return out;
}
