import { INVENTORY_READERS } from '$lib/inventory/roles';
import { requireRole } from '$lib/server/auth/guards';
import { csvResponse } from '$lib/server/inventory-http';
import { exportModelsCsv } from '$lib/server/services/inventory-csv';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	requireRole(event, ...INVENTORY_READERS);
	return csvResponse(await exportModelsCsv('amplifiers'), 'amplifiers.csv');
};
