/** The outcome a saved or fresh result shows, and its words. Pure. */
import type { Evaluation, Outcome } from '../acoustics';

export const OUTCOME_WORDS: Record<Outcome, string> = {
	clear: 'Clear',
	tight: 'Tight',
	'over-limit': 'Over the limit',
	short: 'Short'
};

interface ResultLike {
	verdict: string;
	outcome?: Outcome;
	evaluation: Pick<Evaluation, 'boundary'> & { outcome?: Outcome } | null;
}

/**
 * A result's outcome. Versions saved before outcomes existed carry only a verdict: a boundary they
 * predicted over its limit still reads "over the limit", never "clear".
 */
export function outcomeOf(result: ResultLike): Outcome {
	if (result.verdict === 'short') return 'short';
	if (result.outcome) return result.outcome;
	if (result.evaluation?.outcome) return result.evaluation.outcome;
	if (result.evaluation?.boundary && result.evaluation.boundary.marginDb < 0) return 'over-limit';
	return result.verdict === 'tight' ? 'tight' : 'clear';
}
