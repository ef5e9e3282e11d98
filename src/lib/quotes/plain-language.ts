/** The quote in words a client reads: what level where, what it costs, what it assumes. */
import { formatMoney } from './pricing';
import type { PackageResult } from './evaluate-packages';
import type { QuoteRequestInput } from '../schemas/evaluation';

export function distanceText(value: number, unit: 'm' | 'ft'): string {
	return `${Number(value.toFixed(1))} ${unit}`;
}

export function levelPromise(request: QuoteRequestInput): string {
	return `${request.targetDb} dB(${request.weighting}) average level (Leq) at ${distanceText(request.distance, request.distanceUnit)} from the system`;
}

export function headroomSentence(result: PackageResult): string {
	if (!result.evaluation) return 'This package could not be assessed for the request.';
	const h = result.evaluation.headroomDb;
	if (!Number.isFinite(h)) return 'Part of the programme’s frequency range is not covered by this package.';
	if (h >= 0) return `It has ${h.toFixed(1)} dB in reserve over the programme’s peaks in its most demanding octave band.`;
	return `It falls ${Math.abs(h).toFixed(1)} dB short of the programme’s peaks in its most demanding octave band.`;
}

export function boundarySentence(result: PackageResult, request: QuoteRequestInput): string | null {
	const b = result.evaluation?.boundary;
	if (!b || !request.boundary) return null;
	const where = distanceText(request.boundary.distance, request.distanceUnit);
	const predicted = Number.isFinite(b.predictedDb) ? `${b.predictedDb.toFixed(1)} dB(${b.weighting})` : 'no measurable level';
	const verdict = b.marginDb >= 0
		? `within the ${b.limitDb} dB(${b.weighting}) limit by ${b.marginDb.toFixed(1)} dB`
		: `over the ${b.limitDb} dB(${b.weighting}) limit by ${Math.abs(b.marginDb).toFixed(1)} dB`;
	return `At the boundary, ${where} away, we predict ${predicted}: ${verdict}. To stay within the limit the level at the mix position should not exceed ${b.maxTargetDb.toFixed(1)} dB(${request.weighting}).`;
}

export function moneyLines(result: PackageResult): { label: string; value: string }[] {
	const p = result.price;
	return [
		{ label: `Hire (${p.hireDays} day${p.hireDays === 1 ? '' : 's'})`, value: formatMoney(p.subtotalMinor, p.currency) },
		{ label: `Tax (${p.taxRateBp / 100} %)`, value: formatMoney(p.taxMinor, p.currency) },
		{ label: 'Total', value: formatMoney(p.totalMinor, p.currency) },
		{ label: `Deposit to confirm (${p.depositBp / 100} %)`, value: formatMoney(p.depositMinor, p.currency) }
	];
}

/** The short form of the cautions, for e-mails and the client's view. */
export const CLIENT_CAUTIONS = [
	'These figures are predictions for open, flat ground with no wind or temperature gradient. Levels on the day depend on the site and the weather; we measure on site.',
	'Wind towards the boundary or a temperature inversion can raise the level there well above the prediction.',
	'Local noise regulations, the licensing authority’s conditions and hearing-safety rules take precedence over any prediction.'
];
