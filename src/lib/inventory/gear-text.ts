import { bandLabel, type BandResponse, type DirectivityTable } from '$lib/schemas/directivity';
import { NOMINAL_BANDS } from '$lib/schemas/programmes';
import { formatMoney } from '$lib/quotes/pricing';

/**
 * Band response and directivity tables as people read them, for history entries and summaries:
 * bands in frequency order ("31.5 Hz" first, although JavaScript lists it after "8000").
 */
const minus = (n: number) => String(n).replace('-', '−');

export function bandResponseText(response: BandResponse | null | undefined): string {
	if (!response) return 'flat (not given)';
	return NOMINAL_BANDS.filter((b) => response[b] != null)
		.map((b) => `${bandLabel(b)} ${minus(response[b]!)}`)
		.join(', ');
}

export function directivityText(table: DirectivityTable | null | undefined): string {
	if (!table) return 'none';
	const rows = NOMINAL_BANDS.filter((b) => table.bandsDb[b]).map((b) => `${bandLabel(b)}: ${table.bandsDb[b]!.map(minus).join(' ')}`);
	return [`at ${table.anglesDeg.join(' ')}°`, ...rows].join('; ');
}

/** A spec history value: money with its currency, the two JSON fields in words, anything else as stored. */
export function historyValueText(field: string, stored: string | null, currency: string): string | null {
	if (stored !== null && field.endsWith('Minor') && /^-?\d+$/.test(stored)) return formatMoney(Number(stored), currency);
	if (stored === null || (field !== 'directivity' && field !== 'bandResponseDb')) return stored;
	try {
		const value = JSON.parse(stored);
		return field === 'directivity' ? directivityText(value) : bandResponseText(value);
	} catch {
		return stored;
	}
}
