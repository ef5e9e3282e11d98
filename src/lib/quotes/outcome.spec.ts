import { describe, expect, it } from 'vitest';
import { outcomeOf, OUTCOME_WORDS } from './outcome';

const boundary = (marginDb: number) => ({ predictedDb: 60, limitDb: 60 + marginDb, weighting: 'A' as const, marginDb, maxTargetDb: 90 });

describe('outcomeOf', () => {
	it('takes the stored outcome when there is one', () => {
		expect(outcomeOf({ verdict: 'clear', outcome: 'over-limit', evaluation: null })).toBe('over-limit');
		expect(outcomeOf({ verdict: 'clear', evaluation: { boundary: null, outcome: 'tight' } })).toBe('tight');
	});
	it('never reads an older version over its boundary limit as clear', () => {
		expect(outcomeOf({ verdict: 'clear', evaluation: { boundary: boundary(-19) } })).toBe('over-limit');
		expect(outcomeOf({ verdict: 'clear', evaluation: { boundary: boundary(2) } })).toBe('clear');
	});
	it('keeps short (no stock, or not enough level) as short', () => {
		expect(outcomeOf({ verdict: 'short', outcome: 'clear', evaluation: { boundary: boundary(-1) } })).toBe('short');
	});
	it('words over-limit plainly', () => {
		expect(OUTCOME_WORDS['over-limit']).toBe('Over the limit');
	});
});
