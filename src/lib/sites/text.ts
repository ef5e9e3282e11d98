/** Words and numbers the plan and its table print about receivers and levels. */
import type { Receiver, ReceiverResult } from '../acoustics';

/** "dB(A)", or "dB at 63 Hz" for a limit on one octave band (unweighted). */
export function levelUnit(receiver: Pick<Receiver, 'weighting' | 'bandHz'>): string {
	return receiver.bandHz ? `dB at ${receiver.bandHz} Hz` : `dB(${receiver.weighting})`;
}

export function limitText(receiver: Pick<Receiver, 'limitDb' | 'weighting' | 'bandHz'>): string {
	return `limit ${formatDb(receiver.limitDb)} ${levelUnit(receiver)}`;
}

/** One decimal; a dash for nothing to show. */
export function formatDb(value: number | null | undefined): string {
	return typeof value === 'number' && Number.isFinite(value) ? value.toFixed(1) : '–';
}

/** A margin with its sign and a word, so "over" never depends on colour alone. */
export function marginText(marginDb: number | null | undefined): string {
	if (typeof marginDb !== 'number' || !Number.isFinite(marginDb)) return '–';
	if (marginDb < 0) return `${Math.abs(marginDb).toFixed(1)} dB over`;
	return `${marginDb.toFixed(1)} dB under`;
}

/** The model's result for a site receiver: same index and name, else the first with its name. */
export function resultFor(
	results: readonly ReceiverResult[] | null | undefined,
	receiver: Pick<Receiver, 'name'>,
	index: number
): ReceiverResult | null {
	if (!results) return null;
	if (results[index]?.name === receiver.name) return results[index];
	return results.find((r) => r.name === receiver.name) ?? null;
}
