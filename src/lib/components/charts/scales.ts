/**
 * Pure number helpers for the SVG charts: scales, ticks, paths and the text we print beside values.
 * No DOM and no Svelte here, so all of it is unit-tested on its own. Scales and paths come from
 * d3-scale and d3-shape; the ticks, domains and text are ours (dB axes step in 5, 10 or 20 dB).
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { Weighting } from '../../acoustics/types';
import { fromMetres, toMetres, type DistanceUnit } from '../../acoustics/units';

export type BandVerdict = 'clear' | 'tight' | 'short' | 'not-covered';

/** A true number that can be drawn: JSON turns −Infinity into null, and either means "nothing here". */
export function isDrawable(value: number | null | undefined): value is number {
	return typeof value === 'number' && Number.isFinite(value);
}

export function clamp(value: number, min: number, max: number): number {
	return Math.min(max, Math.max(min, value));
}

/**
 * Maps a domain linearly onto a range (either may run backwards, as the y axis does); d3-scale's
 * linear scale, except that a flat domain puts everything at the range's start rather than its middle.
 */
export function linearScale(
	[d0, d1]: readonly [number, number],
	range: readonly [number, number]
): (value: number) => number {
	const scale = scaleLinear()
		.domain(d1 === d0 ? [d0, d0 + 1] : [d0, d1])
		.range([range[0], range[1]]);
	return (value) => scale(value);
}

/** Maps a positive domain logarithmically onto a range (d3-scale's log scale). */
export function logScale(
	[d0, d1]: readonly [number, number],
	range: readonly [number, number]
): (value: number) => number {
	if (!(d0 > 0 && d1 > 0)) throw new RangeError('A log scale needs a positive domain');
	const scale = scaleLog().domain([d0, d1]).range([range[0], range[1]]);
	return (value) => scale(value);
}

/** Mantissa sets from densest to sparsest; the first that fits within maxCount ticks is used. */
const LOG_STEPS: readonly (readonly number[])[] = [[1, 2, 5], [1, 5], [1]];

/**
 * "Nice" ticks on a log axis between min and max inclusive: 1, 2, 5, 10, 20, 50 … when there is
 * room, thinning to 1, 5, 10, 50 … and then to whole decades (every other one if still too many).
 */
export function logTicks(min: number, max: number, maxCount = 8): number[] {
	if (!(min > 0) || !(max >= min)) return [];
	const first = Math.floor(Math.log10(min));
	const last = Math.ceil(Math.log10(max));
	const within = (mantissas: readonly number[]) => {
		const ticks: number[] = [];
		for (let exp = first; exp <= last; exp++) {
			for (const m of mantissas) {
				// Rounding keeps 0.1 × 3 from becoming 0.30000000000000004.
				const tick = Number((m * 10 ** exp).toPrecision(12));
				if (tick >= min * (1 - 1e-9) && tick <= max * (1 + 1e-9)) ticks.push(tick);
			}
		}
		return ticks;
	};
	for (const mantissas of LOG_STEPS) {
		const ticks = within(mantissas);
		if (ticks.length <= Math.max(2, maxCount)) return ticks;
	}
	const decades = within([1]);
	const stride = Math.ceil(decades.length / Math.max(2, maxCount));
	return decades.filter((_, i) => i % stride === 0);
}

/** A dB tick step of 5, 10 or 20 that gives at most maxCount intervals over the span. */
export function dbStep(span: number, maxCount = 6): number {
	for (const step of [5, 10, 20]) if (span / step <= maxCount) return step;
	return 20;
}

/** Multiples of step from min to max inclusive (min and max should be multiples already). */
export function linearTicks(min: number, max: number, step: number): number[] {
	if (!(step > 0) || !(max >= min)) return [];
	const ticks: number[] = [];
	for (let v = Math.ceil(min / step) * step; v <= max + 1e-9; v += step)
		ticks.push(Number(v.toFixed(6)));
	return ticks;
}

/**
 * A dB axis range covering every drawable value, widened to whole multiples of step and to at least
 * minSpan so that a nearly flat curve is not blown up into a cliff.
 */
export function dbDomain(
	values: readonly (number | null)[],
	step: number,
	minSpan = 2 * step
): [number, number] {
	const drawable = values.filter(isDrawable);
	if (drawable.length === 0) return [0, minSpan];
	let lo = Math.floor(Math.min(...drawable) / step) * step;
	let hi = Math.ceil(Math.max(...drawable) / step) * step;
	if (hi - lo < minSpan) {
		const grow = Math.ceil((minSpan - (hi - lo)) / step / 2) * step;
		lo -= grow;
		hi += grow;
	}
	return [lo, hi];
}

type PlotPoint = { x: number; y: number | null };

/** d3-shape's line, lifting the pen over points that cannot be drawn; coordinates to 0.01 px. */
const plotLine = line<PlotPoint>()
	.defined((p) => isDrawable(p.x) && isDrawable(p.y))
	.x((p) => p.x)
	.y((p) => p.y as number)
	.digits(2);

/**
 * An SVG path through the points, lifting the pen over undrawable ones, so a package that covers
 * nothing at some distances leaves a gap rather than a line to −Infinity. Empty string if none.
 */
export function linePath(points: readonly PlotPoint[]): string {
	return plotLine(points as PlotPoint[]) ?? '';
}

/** Typographic minus: it reads as "minus" to screen readers and lines up with "+". */
const MINUS = '\u2212';

/** "+4.2", "−3.0", "0.0" (no sign on a value that rounds to zero). */
export function formatSigned(value: number, digits = 1): string {
	const text = Math.abs(value).toFixed(digits);
	if (Number(text) === 0) return text;
	return (value < 0 ? MINUS : '+') + text;
}

/** A headroom or margin: "+4.2 dB", "−3.0 dB", or "not covered" when there is no number. */
export function formatDb(value: number | null | undefined): string {
	return isDrawable(value) ? `${formatSigned(value)} dB` : 'not covered';
}

/** An absolute level: "98.3 dB(A)" (or "98.3 dB" without a weighting), "—" when there is none. */
export function formatLevel(value: number | null | undefined, weighting?: Weighting): string {
	if (!isDrawable(value)) return '—';
	const text = value.toFixed(1).replace('-', MINUS);
	return weighting ? `${text} dB(${weighting})` : `${text} dB`;
}

/** Octave-band label as printed under the bars: 31.5, 63 … 500, 1k, 2k, 4k, 8k. */
export function formatBandHz(hz: number): string {
	if (hz >= 1000) return `${Number((hz / 1000).toPrecision(3))}k`;
	return `${Number(hz.toPrecision(3))}`;
}

export function toDisplayDistance(metres: number, unit: DistanceUnit): number {
	return fromMetres(metres, unit);
}

export function fromDisplayDistance(value: number, unit: DistanceUnit): number {
	return toMetres(value, unit);
}

/** A distance in the display unit without the unit: "30", "98", "2.5" (one decimal below 10). */
export function formatDistanceNumber(metres: number, unit: DistanceUnit): string {
	const value = toDisplayDistance(metres, unit);
	return value < 10 ? String(Number(value.toFixed(1))) : String(Math.round(value));
}

/** "30 m", "98 ft", "2.5 m". */
export function formatDistance(metres: number, unit: DistanceUnit): string {
	return `${formatDistanceNumber(metres, unit)} ${unit}`;
}

/** Axis label for a distance tick already in the display unit: 1, 2, 5 … 1000 → "1k". */
export function formatDistanceTick(value: number): string {
	return value >= 1000
		? `${Number((value / 1000).toPrecision(3))}k`
		: String(Number(value.toPrecision(3)));
}

/** The per-band verdict, matching the package verdict: short below 0, clear at or above the margin. */
export function headroomVerdict(headroomDb: number | null, marginDb: number): BandVerdict {
	if (!isDrawable(headroomDb)) return 'not-covered';
	if (headroomDb < 0) return 'short';
	return headroomDb >= marginDb ? 'clear' : 'tight';
}

/** At most maxRows items, evenly thinned (every other, every third …), always keeping the last. */
export function thinRows<T>(items: readonly T[], maxRows: number): T[] {
	if (items.length <= maxRows) return [...items];
	const stride = Math.ceil(items.length / Math.max(1, maxRows - 1));
	const kept = items.filter((_, i) => i % stride === 0);
	if (kept[kept.length - 1] !== items[items.length - 1]) kept.push(items[items.length - 1]);
	return kept;
}
