/**
 * Kestrel Yard Audio's four stock programme profiles (invented, typical approximations of each kind of
 * show, not measurements; the UI labels them so). Relative octave-band levels as heard at the mix
 * position, shaped so that the C-minus-A gap there is that of amplified music: roughly 10–20 dB for
 * pop/rock and dance, less for acoustic sets and least for speech (common practice; checked by
 * tests/unit/programme-profiles.spec.ts). Crest factors follow the usual ranges: speech about 12 dB,
 * music 12–20 dB, heavily compressed pop 6–9 dB (common practice).
 */
export const programmes = [
	{
		slug: 'speech',
		name: 'Speech',
		description: 'Announcements, talks and ceremonies. Little below 125 Hz matters.',
		bands: { '125': -6, '250': -2, '500': 0, '1000': -2, '2000': -6, '4000': -11, '8000': -18 },
		crestFactorDb: 12,
		sortOrder: 1
	},
	{
		slug: 'acoustic',
		name: 'Acoustic music',
		description: 'Folk, jazz and acoustic sets: a gentle low end and wide dynamics.',
		bands: { '63': -2, '125': 1, '250': 0, '500': -2, '1000': -4, '2000': -7, '4000': -11, '8000': -16 },
		crestFactorDb: 15,
		sortOrder: 2
	},
	{
		slug: 'pop-rock',
		name: 'Pop / rock',
		description: 'Live bands: a strong kick and bass, mixed with moderate compression.',
		bands: { '63': 7, '125': 5, '250': -1, '500': -6, '1000': -9, '2000': -12, '4000': -16, '8000': -21 },
		crestFactorDb: 10,
		sortOrder: 3
	},
	{
		slug: 'dance',
		name: 'Dance / electronic',
		description: 'DJ sets: sub-bass heavy and tightly compressed.',
		bands: { '31.5': 3, '63': 8, '125': 4, '250': -3, '500': -8, '1000': -11, '2000': -14, '4000': -17, '8000': -22 },
		crestFactorDb: 8,
		sortOrder: 4
	}
];
