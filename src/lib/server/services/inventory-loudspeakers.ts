import { LOUDSPEAKER_CSV_COLUMNS } from '$lib/inventory/csv';
import { LOUDSPEAKER_ACOUSTIC_FIELDS, loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { LoudspeakerModel } from '../db/models';
import { specModelService } from './inventory-spec-models';

/** Loudspeaker models: list, get, create, update (with history and quote re-check), delete. */
export const loudspeakers = specModelService({
	modelType: 'loudspeaker',
	model: LoudspeakerModel,
	schema: loudspeakerSchema,
	fields: LOUDSPEAKER_CSV_COLUMNS,
	acousticFields: LOUDSPEAKER_ACOUSTIC_FIELDS
});
