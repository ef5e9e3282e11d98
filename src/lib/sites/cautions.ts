/**
 * What a prediction with a site leaves out, in plain words, shown beside every site prediction next
 * to the model's own assumptions (shared/acoustics.md, "What the model leaves out").
 */
export const SITE_CAUTIONS: readonly string[] = Object.freeze([
	'Ground effect follows ISO 9613-2, which assumes propagation downwind (the cautious case for a limit).',
	'Without the maker’s polar data the default directivity is deliberately cautious: enter the maker’s data for each cabinet.',
	'Barriers, buildings, reflections, delay towers and curved-array behaviour are not modelled.',
	'Wind and temperature inversion can add more than the allowance at a distant receiver.',
	'Local regulations, licensing conditions and licensed practice take precedence over any prediction. Measure on site.'
]);
