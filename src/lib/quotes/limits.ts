import type { Evaluation } from '../acoustics';

/** What limits a package, in the desk's words. */
export const LIMITED_BY_LABELS: Record<NonNullable<Evaluation['limitedBy']> | 'availability' | 'boundary' | 'receiver', string> = {
	amplifier: 'amplifier power',
	thermal: 'cabinet power rating',
	'max-spl': 'cabinet max SPL',
	'no-coverage': 'no cabinet covers a band the programme needs',
	coverage: 'coverage of the audience width',
	availability: 'not enough units on those dates',
	boundary: 'boundary limit',
	receiver: 'over the limit at'
};
