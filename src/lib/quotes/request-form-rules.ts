/** Small rules of the desk's request form, kept pure so they are tested without a browser. */
import { fromMetres, toMetres, type DistanceUnit } from '../acoustics/units';
import type { PackageResult } from './evaluate-packages';


type Distances = { distance: number; audienceWidth: number | null; boundaryDistance: number | null };

function convert(value: number, from: DistanceUnit, to: DistanceUnit): number {
	if (from === to) return value;
	const result = fromMetres(toMetres(value, from), to);
	return Math.round(result * 10) / 10;
}

/** Every distance of the request in the new unit, so switching m ↔ ft keeps the same place. */
export function convertDistances<T extends Distances>(form: T, from: DistanceUnit, to: DistanceUnit): Distances {
	const maybe = (v: number | null) => (v === null || !Number.isFinite(v) ? v : convert(v, from, to));
	return { distance: convert(form.distance, from, to), audienceWidth: maybe(form.audienceWidth), boundaryDistance: maybe(form.boundaryDistance) };
}

/** "Hire until" moves with "Hire from" when it would otherwise fall before it (ISO dates compare as text). */
export function endAfterStart(startDate: string, endDate: string): string {
	if (!startDate) return endDate;
	return !endDate || endDate < startDate ? startDate : endDate;
}

/**
 * The package the form holds: the best-ranked one until the desk picks one; the desk's pick stays
 * while it is still offered.
 */
export function heldPackage(results: Pick<PackageResult, 'packageId'>[], current: number | null, pickedByDesk: boolean): number | null {
	if (results.length === 0) return current;
	if (pickedByDesk && results.some((r) => r.packageId === current)) return current;
	return results[0].packageId;
}
