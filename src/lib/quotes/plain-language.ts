/** The quote in words a client reads: what level where, what it costs, what it assumes. */
import { formatMoney } from './pricing';
import type { PackageResult } from './evaluate-packages';
import type { QuoteRequestInput } from '../schemas/evaluation';
import type { SiteSnapshot } from '../schemas/sites';
import { limitLabel } from '../sites/model-site';
import { OUTCOME_WORDS, outcomeOf } from './outcome';
import type { Outcome } from '../acoustics';
import { fromMetres, type DistanceUnit } from '../acoustics/units';

export function distanceText(value: number, unit: 'm' | 'ft'): string {
	return `${Number(value.toFixed(1))} ${unit}`;
}

/** The width a package covers at the position, in the unit the request was made in ("39 ft wide"). */
export function coverageText(widthM: number, unit: DistanceUnit): string {
	if (!Number.isFinite(widthM)) return 'all round';
	return `${fromMetres(widthM, unit).toFixed(0)} ${unit} wide`;
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
	return `At the boundary, ${where} away, we predict ${predicted}: ${verdict}. To stay within the limit the level at front of house should not exceed ${b.maxTargetDb.toFixed(1)} dB(${request.weighting}).`;
}

/** "Over the limit" in words: which neighbour, by how much, and the level that would keep them all within limits. */
export function limitsSentence(result: PackageResult, request: QuoteRequestInput): string | null {
	const limits = result.limits ?? result.evaluation?.limits;
	if (!limits || limits.maxTargetDb === null) return null;
	const ceiling = `${limits.maxTargetDb.toFixed(1)} dB(${request.weighting})`;
	if (outcomeOf(result) === 'over-limit') {
		return `Over the limit: at ${request.targetDb} dB(${request.weighting}) this would exceed the limit at ${limits.bindingReceiver}. The level at front of house should not exceed ${ceiling} to keep every neighbour within its limit.`;
	}
	return `Every neighbour stays within its limit; the limit at ${limits.bindingReceiver} binds first, at ${ceiling} at front of house.`;
}

/** One line per receiver: predicted level against its limit. */
export function receiverLines(result: PackageResult): string[] {
	return (result.receivers ?? []).map((r) => {
		const predicted = r.predictedDb === null ? 'no prediction' : `${r.predictedDb.toFixed(1)} dB predicted`;
		const margin = r.marginDb === null ? '' : r.marginDb >= 0 ? `, ${r.marginDb.toFixed(1)} dB within` : `, ${Math.abs(r.marginDb).toFixed(1)} dB OVER`;
		return `${r.name}: ${predicted} against ${limitLabel(r)}${margin}`;
	});
}

/** The site a quote was evaluated with, named for the client. */
export function siteSentence(site: SiteSnapshot | null): string | null {
	if (!site) return null;
	const count = site.receivers.length;
	return `Predicted for ${site.name}${site.address ? ` (${site.address})` : ''}, with ${count} neighbouring point${count === 1 ? '' : 's'} and their licence limits${site.allowanceDb ? `, including a ${site.allowanceDb} dB allowance for weather` : ''}.`;
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
	'These figures are predictions over flat ground, with the wind assumed to blow towards the neighbours (ISO 9613-2). Levels on the day depend on the site and the weather; we measure on site.',
	'A temperature inversion or a stronger wind can raise the level at a distant neighbour above the prediction and any allowance.',
	'Barriers, buildings, reflections and delay towers are not modelled.',
	'Local noise regulations and the licensing authority’s conditions take precedence over any prediction.',
	'Hearing safety: sound at these levels can damage hearing. Exposure limits for the audience and crew apply whatever the prediction; plan for them and offer hearing protection.'
];

/** One sentence a client reads beside the assessment: what each outcome means for their event. */
export const OUTCOME_MEANING =
	'Clear means the system reaches the level you asked for with power in reserve; Tight means it reaches it with little to spare, so it will run close to its limits; Short means it cannot reliably reach that level; Over the limit means that at that level a neighbour or the site boundary would be louder than the licence allows, so the level has to come down.';

/** The assessment line of the e-mail and the quote document: the outcome, then what it means. */
export function assessmentText(outcome: Outcome): string {
	return `Assessment: ${OUTCOME_WORDS[outcome]}. ${OUTCOME_MEANING}`;
}
