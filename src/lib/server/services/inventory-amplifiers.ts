import { AMPLIFIER_CSV_COLUMNS } from '$lib/inventory/csv';
import { AMPLIFIER_ACOUSTIC_FIELDS, amplifierSchema } from '$lib/schemas/inventory-amplifiers';
import { AmplifierModel } from '../db/models';
import { specModelService } from './inventory-spec-models';

/** Amplifier models: list, get, create, update (with history and quote re-check), delete. */
export const amplifiers = specModelService({
	modelType: 'amplifier',
	model: AmplifierModel,
	schema: amplifierSchema,
	fields: AMPLIFIER_CSV_COLUMNS,
	acousticFields: AMPLIFIER_ACOUSTIC_FIELDS
});
