import type { Transaction } from 'sequelize';

export type SpecModelType = 'loudspeaker' | 'amplifier';

/**
 * Called by the inventory services whenever a specification field the acoustic model uses changes.
 * Flags every open quote that used the model for a re-check and returns how many were flagged.
 * (Quotes arrive with the quoting work; until then there is nothing to flag.)
 */
export async function flagQuotesForSpecChange(
	_modelType: SpecModelType,
	_modelId: number,
	_transaction?: Transaction
): Promise<number> {
	return 0;
}
