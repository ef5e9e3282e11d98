/**
 * The model's stated simplifications in plain language, shown beside every prediction in the UI so
 * the same text appears everywhere. Frozen at run time; typed string[] for the UI's convenience.
 */
export const MODEL_ASSUMPTIONS: string[] = [
	'Without a site, predictions assume free field on the system’s axis: no ground, buildings or stage reflections.',
	'With a site, ground effect follows ISO 9613-2, which assumes the wind blows from the system towards each receiver (downwind): the cautious case for a limit.',
	'Every cabinet group is treated as standing at one point, with horizontal directivity only. Barriers, buildings, reflections, delay towers and curved-array behaviour are not modelled.',
	'Where no polar data is entered, the directivity used is deliberately cautious: real cabinets reject more behind them. Enter the maker’s polar data for a closer prediction.',
	'Air absorption follows ISO 9613-1 for the temperature and humidity entered. Wind and temperature inversion can raise the level at a distant receiver by more than the allowance entered. Measure on site.',
	'Line arrays use the simple transition distance (array length² × frequency ÷ 2c). Published methods differ by up to a factor of two, and off the centreline the simple form understates the transition.',
	'Local noise regulations, the licensing authority’s conditions and licensed practice take precedence over any prediction.',
	'Occupational and hearing-safety rules apply to audience and crew whatever the prediction: plan exposure limits and offer hearing protection.'
];
Object.freeze(MODEL_ASSUMPTIONS);
