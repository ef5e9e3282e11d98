/**
 * The one way Throwline writes a date for people: "12 Jun 2027", everywhere (pages, e-mails, the
 * quote document). Built by hand rather than with Intl so every runtime prints the same month
 * abbreviations (some print "Sept"), and in UTC so the server and the browser agree.
 */
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

function parse(value: string | Date): Date | null {
	const date = value instanceof Date ? value : new Date(/^\d{4}-\d{2}-\d{2}$/.test(value) ? `${value}T00:00:00Z` : value);
	return Number.isNaN(date.getTime()) ? null : date;
}

/** "12 Jun 2027"; a date-only string is read as that calendar day; none is "—"; anything unreadable is returned as given. */
export function formatDate(value: string | Date | null | undefined): string {
	if (value == null) return '—';
	const d = parse(value);
	if (!d) return String(value);
	return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

/** "12 Jun 2027, 14:05 UTC": for moments (when a change was made, when an e-mail went). */
export function formatDateTime(value: string | Date): string {
	const d = parse(value);
	if (!d) return String(value);
	const hh = String(d.getUTCHours()).padStart(2, '0');
	const mm = String(d.getUTCMinutes()).padStart(2, '0');
	return `${formatDate(d)}, ${hh}:${mm} UTC`;
}

/** "12 Jun 2027 to 14 Jun 2027", or one date when the hire is a single day. */
export function formatDateRange(start: string, end: string): string {
	return start === end ? formatDate(start) : `${formatDate(start)} to ${formatDate(end)}`;
}
