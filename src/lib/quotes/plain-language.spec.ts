import { describe, expect, it } from 'vitest';
import { assessmentText, CLIENT_CAUTIONS, coverageText, OUTCOME_MEANING } from './plain-language';

describe('coverage in words', () => {
	it('says the width in the unit of the request (1 ft = 0.3048 m exactly, by definition)', () => {
		expect(coverageText(12, 'm')).toBe('12 m wide');
		expect(coverageText(12, 'ft')).toBe('39 ft wide'); // 12 / 0.3048 = 39.37
		expect(coverageText(30.48, 'ft')).toBe('100 ft wide');
	});

	it('says "all round" when nothing narrows it', () => {
		expect(coverageText(Infinity, 'ft')).toBe('all round');
	});
});

describe('what a client reads beside a prediction', () => {
	it('one sentence says what Clear, Tight, Short and Over the limit mean for them', () => {
		expect(OUTCOME_MEANING.split(/(?<=\.)\s/)).toHaveLength(1);
		for (const word of ['Clear means', 'Tight means', 'Short means', 'Over the limit means']) expect(OUTCOME_MEANING).toContain(word);
		expect(assessmentText('tight')).toBe(`Assessment: Tight. ${OUTCOME_MEANING}`);
	});

	it('the short cautions carry hearing safety and leave out the modelling footnotes', () => {
		expect(CLIENT_CAUTIONS.some((c) => c.startsWith('Hearing safety'))).toBe(true);
		expect(CLIENT_CAUTIONS.join(' ')).not.toMatch(/transition distance|polar data/);
	});
});
