import { requireCapability } from '$lib/server/auth/guards';
import { csvResponse } from '$lib/server/inventory-http';
import { exportModelsCsv } from '$lib/server/services/inventory-csv';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireCapability(event, 'inventory:read');
	return csvResponse(await exportModelsCsv('loudspeakers'), 'loudspeakers.csv');
};
