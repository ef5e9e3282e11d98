import { requireCapability } from '$lib/server/auth/guards';
import { csvResponse } from '$lib/server/http/inventory-files';
import { exportModelsCsv } from '$lib/server/services/inventory-csv';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return csvResponse(await exportModelsCsv('loudspeakers'), 'loudspeakers.csv');
};
