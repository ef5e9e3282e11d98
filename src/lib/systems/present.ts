/** A found system as the desk sees it: priced like a package, with a line on why it is offered. Pure. */
import { formatMoney } from '../quotes/pricing';
import { evaluateOne, type EvaluationContext, type PackageResult } from '../quotes/evaluate-packages';
import type { LoadedGroup, LoadedPackage } from '../inventory';
import type { Candidate, Obstacles } from './search';

/** The answer to a search: systems that clear the limits, the closest ones if none does, and why. */
export interface Suggestions {
	systems: SuggestedSystem[];
	closest: SuggestedSystem[];
	complete: boolean;
	evaluated: number;
	obstacles: string[];
	currency: string;
}

export interface SystemGroup {
	loudspeakerModelId: number;
	loudspeakerName: string;
	count: number;
	stacks: number;
	amplifierModelId: number;
	amplifierName: string;
	cabinetsPerChannel: number;
	heightM: number | null;
	flown: boolean;
}

export interface SuggestedSystem extends PackageResult {
	groups: SystemGroup[];
	totalMinor: number;
	weightKg: number;
	mainsCurrentA: number;
	why: string;
}

export function systemGroups(groups: readonly LoadedGroup[]): SystemGroup[] {
	return groups.map((g) => ({
		loudspeakerModelId: g.loudspeaker.id,
		loudspeakerName: g.loudspeaker.name,
		count: g.count,
		stacks: g.stacks,
		amplifierModelId: g.amplifier.id,
		amplifierName: g.amplifier.name,
		cabinetsPerChannel: g.cabinetsPerChannel,
		heightM: g.heightM ?? null,
		flown: g.flown
	}));
}

/** A name from its lines: "2 × 2 Top A + 2 × Sub B" (stacks × cabinets each, when there are two stacks). */
export function systemName(groups: readonly LoadedGroup[]): string {
	return groups.map((g) => `${g.stacks > 1 ? `${g.stacks} × ${g.count}` : g.count} × ${g.loudspeaker.name}`).join(' + ');
}

function whyLine(result: PackageResult, index: number, first: PackageResult | undefined): string {
	const headroom = `${result.headroomDb.toFixed(1)} dB headroom`;
	const limits = result.receivers.length > 0 ? '; every receiver within its limit' : '';
	if (result.outcome !== 'clear') return `Closest in stock: ${result.outcome}, ${headroom}${result.limitedBy ? ` (${result.limitedBy})` : ''}`;
	if (index === 0 || !first) return `Cheapest clear system in stock: ${headroom}${limits}`;
	const more = result.price.totalMinor - first.price.totalMinor;
	const extra = result.headroomDb - first.headroomDb;
	return `${extra > 0 ? `${extra.toFixed(1)} dB more headroom` : `${headroom}`} for ${formatMoney(more, result.price.currency)} more${limits}`;
}

/** Prices and checks each candidate like a package (the same availability and pricing rules). */
export function presentSystems(candidates: readonly Candidate[], ctx: EvaluationContext): SuggestedSystem[] {
	const results = candidates.map((c, i) => {
		const pkg: LoadedPackage = { id: 0, name: systemName(c.groups), slug: `system-${i + 1}`, description: '', active: true, createdAt: '', updatedAt: '', groups: c.groups };
		return evaluateOne(pkg, ctx);
	});
	return results.map((r, i) => ({
		...r,
		groups: systemGroups(candidates[i].groups),
		totalMinor: r.price.totalMinor,
		weightKg: r.billOfMaterials.totalWeightKg,
		mainsCurrentA: r.billOfMaterials.mainsCurrentAmps,
		why: whyLine(r, i, results[0])
	}));
}

/** What stands in the way, in words. */
export function obstacleLines(o: Obstacles | null): string[] {
	if (!o) return [];
	return [
		...o.bandsShort.map((b) => `The ${b.hz} Hz band is short even with everything in stock (best headroom ${b.bestHeadroomDb.toFixed(1)} dB)`),
		...(o.receiverOver ? [`Receiver ${o.receiverOver.name} would be over its limit at the level asked${o.receiverOver.maxTargetDb !== null ? `; its limit allows at most ${o.receiverOver.maxTargetDb.toFixed(1)} dB at the position` : ''}`] : []),
		...o.modelsRunOut.map((name) => `${name} runs out on these dates`)
	];
}

/** A system's groups as the quote's `system` body (and the request form's hidden field). */
export function systemFormValue(s: Pick<SuggestedSystem, 'groups'>): string {
	return JSON.stringify({
		groups: s.groups.map(({ loudspeakerModelId, count, stacks, amplifierModelId, cabinetsPerChannel, heightM, flown }) => ({
			loudspeakerModelId, count, stacks, amplifierModelId, cabinetsPerChannel, heightM, flown
		}))
	});
}
