import { LOUDSPEAKER_ACOUSTIC_FIELDS, loudspeakerFields, loudspeakerSchema } from '$lib/schemas/inventory-loudspeakers';
import { LoudspeakerModel } from '../db/models';
import { specModelService } from './inventory-spec-models';

/** Loudspeaker models: list, get, create, update (with history and quote re-check), delete. */
export const loudspeakers = specModelService({
	modelType: 'loudspeaker',
	model: LoudspeakerModel,
	schema: loudspeakerSchema,
	// Every stored field, the band response and directivity table included (history compares them as JSON).
	fields: Object.keys(loudspeakerFields.shape),
	acousticFields: LOUDSPEAKER_ACOUSTIC_FIELDS
});
