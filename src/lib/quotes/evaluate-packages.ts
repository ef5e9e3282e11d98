/**
 * Evaluates every package against one request: the acoustic verdict, the stock free on the hire
 * dates, the hire price, and a level-versus-distance curve, then ranks them for the desk.
 * Pure: the caller loads packages, stock counts and bookings.
 */
import {
	evaluatePackage,
	levelCurve,
	type Evaluation,
	type LevelPoint,
	type LimitsResult,
	type Outcome,
	type PackageSpec,
	type QuoteRequest,
	type ReceiverResult,
	type Verdict
} from '../acoustics';
import { packageBillOfMaterials, toPackageSpec, type BillOfMaterials, type LoadedPackage } from '../inventory';
import { checkAvailability, type ModelKey, type Reservation } from './availability';
import { LIMITED_BY_LABELS } from './limits';
import { priceHire, type Price, type PriceLineInput, type PriceSettings } from './pricing';
import { rank, effectiveOutcome, effectiveVerdict } from './ranking';
import { chartDistances } from './request';
import type { ModelType } from '../inventory/types';

export interface ShortfallLine {
	modelType: ModelType;
	modelId: number;
	name: string;
	needed: number;
	available: number;
	missing: number;
}

export interface PackageResult {
	packageId: number;
	packageName: string;
	description: string;
	/** The acoustic verdict, made `short` when the stock is not there on the dates. */
	verdict: Verdict;
	/** The verdict with the site's and boundary's limits taken in; `short` when the stock is not there. */
	outcome: Outcome;
	/** Every limit met? The highest target that keeps them all, and the receiver that binds. */
	limits: LimitsResult;
	/** One per site receiver: predicted level, limit and margin; [] without a site. */
	receivers: ReceiverResult[];
	headroomDb: number;
	limitedBy: string | null;
	/** Set when the package could not be evaluated at all (e.g. a load below an amplifier's minimum). */
	error: string | null;
	evaluation: Evaluation | null;
	availability: { ok: boolean; shortfalls: ShortfallLine[] };
	price: Price;
	billOfMaterials: BillOfMaterials;
	curve: LevelPoint[];
}

export interface EvaluationContext {
	request: QuoteRequest;
	startDate: string;
	endDate: string;
	priceSettings: PriceSettings;
	/** Ready units per model. */
	inService: Partial<Record<ModelKey, number>>;
	reservations: Reservation[];
}

export function priceLinesFor(pkg: LoadedPackage, bom: BillOfMaterials): PriceLineInput[] {
	const rates = new Map<string, number>();
	for (const g of pkg.groups) {
		rates.set(`loudspeaker:${g.loudspeaker.id}`, g.loudspeaker.dayRateMinor);
		rates.set(`amplifier:${g.amplifier.id}`, g.amplifier.dayRateMinor);
	}
	return [
		...bom.loudspeakers.map((l) => ({ description: l.name, quantity: l.count, dayRateMinor: rates.get(`loudspeaker:${l.modelId}`)! })),
		...bom.amplifiers.map((a) => ({ description: a.name, quantity: a.count, dayRateMinor: rates.get(`amplifier:${a.modelId}`)! }))
	];
}

function neededUnits(bom: BillOfMaterials): Partial<Record<ModelKey, number>> {
	const needed: Partial<Record<ModelKey, number>> = {};
	for (const l of bom.loudspeakers) needed[`loudspeaker:${l.modelId}`] = l.count;
	for (const a of bom.amplifiers) needed[`amplifier:${a.modelId}`] = a.count;
	return needed;
}

function limitLabel(evaluation: Evaluation | null, available: boolean): string | null {
	if (!available) return LIMITED_BY_LABELS.availability;
	if (!evaluation) return null;
	if (evaluation.verdict !== 'short' && !evaluation.limits.ok) {
		const binding = evaluation.limits.bindingReceiver;
		return binding && binding !== 'boundary' ? `${LIMITED_BY_LABELS.receiver} ${binding}` : LIMITED_BY_LABELS.boundary;
	}
	return evaluation.limitedBy ? LIMITED_BY_LABELS[evaluation.limitedBy] : null;
}

/**
 * Specs kept by a loaded package's groups. The catalogue cache shares one package between requests
 * (read-only once loaded), so its spec is built once per load, and the acoustic model, which keeps
 * its prepared package by the spec's identity, prepares it once too.
 */
const SPECS = new WeakMap<LoadedPackage['groups'], PackageSpec>();
function specOf(pkg: LoadedPackage): PackageSpec {
	let spec = SPECS.get(pkg.groups);
	if (!spec) {
		spec = toPackageSpec(pkg);
		SPECS.set(pkg.groups, spec);
	}
	return spec;
}

export function evaluateOne(pkg: LoadedPackage, ctx: EvaluationContext): PackageResult {
	const bom = packageBillOfMaterials(pkg.groups);
	const names = new Map<ModelKey, string>([
		...bom.loudspeakers.map((l) => [`loudspeaker:${l.modelId}`, l.name] as [ModelKey, string]),
		...bom.amplifiers.map((a) => [`amplifier:${a.modelId}`, a.name] as [ModelKey, string])
	]);
	const stock = checkAvailability(neededUnits(bom), ctx.inService, ctx.reservations, ctx.startDate, ctx.endDate);
	const shortfalls = stock.shortfalls.map((s) => {
		const [modelType, id] = s.model.split(':') as [ModelType, string];
		return { modelType, modelId: Number(id), name: names.get(s.model) ?? s.model, needed: s.needed, available: s.available, missing: s.missing };
	});
	const price = priceHire(priceLinesFor(pkg, bom), ctx.startDate, ctx.endDate, ctx.priceSettings);

	let evaluation: Evaluation | null = null;
	let curve: LevelPoint[] = [];
	let error: string | null = null;
	try {
		const spec = specOf(pkg);
		evaluation = evaluatePackage(spec, ctx.request);
		curve = levelCurve(spec, ctx.request, chartDistances(ctx.request));
	} catch (err) {
		error = (err as Error).message;
	}
	const acoustic: Verdict = evaluation?.verdict ?? 'short';
	return {
		packageId: pkg.id,
		packageName: pkg.name,
		description: pkg.description,
		verdict: effectiveVerdict({ verdict: acoustic, available: stock.ok }),
		outcome: effectiveOutcome({ outcome: evaluation?.outcome ?? 'short', available: stock.ok }),
		limits: evaluation?.limits ?? { ok: true, maxTargetDb: null, bindingReceiver: null },
		receivers: evaluation?.receivers ?? [],
		headroomDb: evaluation?.headroomDb ?? -Infinity,
		limitedBy: error ? 'cannot be evaluated' : limitLabel(evaluation, stock.ok),
		error,
		evaluation,
		availability: { ok: stock.ok, shortfalls },
		price,
		billOfMaterials: bom,
		curve
	};
}

/** Every package, ranked clear → tight → over the limit → short, then by price. */
export function evaluatePackages(packages: LoadedPackage[], ctx: EvaluationContext): PackageResult[] {
	const results = packages.map((pkg) => evaluateOne(pkg, ctx));
	return rank(
		results.map((r) => ({ ...r, available: r.availability.ok, totalMinor: r.price.totalMinor, name: r.packageName }))
	).map(({ available: _a, totalMinor: _t, name: _n, ...r }) => r);
}
