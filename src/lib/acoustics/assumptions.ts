/**
 * The model's stated simplifications in plain language, shown beside every prediction in the UI so
 * the same text appears everywhere. Frozen at run time; typed string[] for the UI's convenience.
 */
export const MODEL_ASSUMPTIONS: string[] = [
	'Predictions assume free field over flat ground: no reflections from the ground, buildings or stage, and no ground or barrier effects.',
	'All cabinets are assumed to be aimed at the listening position; cabinets add as the model states (tops by energy, subwoofers and array elements in step within a stack).',
	'Air absorption follows ISO 9613-1 for the temperature and humidity entered; wind and temperature gradients are not modelled.',
	'Outdoors, wind and temperature inversion can raise the level at a distant boundary well above this prediction. Measure on site.',
	'Line arrays use the simple transition distance (array length² × frequency ÷ 2c). Published methods differ by up to a factor of two, and off the centreline the simple form understates the transition.',
	'Local noise regulations, the licensing authority’s conditions and occupational and hearing-safety rules take precedence over any prediction.'
];
Object.freeze(MODEL_ASSUMPTIONS);
