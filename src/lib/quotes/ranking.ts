/** Orders evaluated packages for the desk: clear before tight before short, then cheapest first. */
export type Verdict = 'clear' | 'tight' | 'short';

const VERDICT_ORDER: Record<Verdict, number> = { clear: 0, tight: 1, short: 2 };

export interface Rankable {
	verdict: Verdict;
	available: boolean;
	totalMinor: number;
	headroomDb: number;
	name: string;
}

/**
 * A package that cannot be had on the dates is ranked with the short ones: it cannot be sold.
 * Ties on price go to the one with more headroom, then by name for a stable order.
 */
export function effectiveVerdict(item: Pick<Rankable, 'verdict' | 'available'>): Verdict {
	return item.available ? item.verdict : 'short';
}

export function compareForRanking(a: Rankable, b: Rankable): number {
	return (
		VERDICT_ORDER[effectiveVerdict(a)] - VERDICT_ORDER[effectiveVerdict(b)] ||
		a.totalMinor - b.totalMinor ||
		b.headroomDb - a.headroomDb ||
		a.name.localeCompare(b.name)
	);
}

export function rank<T extends Rankable>(items: T[]): T[] {
	return [...items].sort(compareForRanking);
}
