/**
 * Orders evaluated packages for the desk: clear → tight → over the limit → short (contract step 9),
 * then cheapest first.
 */
import { OUTCOME_ORDER, type Outcome, type Verdict } from '../acoustics';

export type { Outcome };

export interface Rankable {
	outcome: Outcome;
	available: boolean;
	totalMinor: number;
	headroomDb: number;
	name: string;
}

/**
 * A package that cannot be had on the dates is ranked with the short ones: it cannot be sold.
 * Ties on price go to the one with more headroom, then by name for a stable order.
 */
export function effectiveVerdict<V extends Verdict | Outcome>(item: { verdict: V; available: boolean }): V | 'short' {
	return item.available ? item.verdict : 'short';
}

export function effectiveOutcome(item: Pick<Rankable, 'outcome' | 'available'>): Outcome {
	return item.available ? item.outcome : 'short';
}

export function compareForRanking(a: Rankable, b: Rankable): number {
	return (
		OUTCOME_ORDER.indexOf(effectiveOutcome(a)) - OUTCOME_ORDER.indexOf(effectiveOutcome(b)) ||
		a.totalMinor - b.totalMinor ||
		b.headroomDb - a.headroomDb ||
		a.name.localeCompare(b.name)
	);
}

export function rank<T extends Rankable>(items: T[]): T[] {
	return [...items].sort(compareForRanking);
}
