/** The overview page: what each role should look at first. */
import { Op } from 'sequelize';
import { can } from '$lib/permissions';
import { quoteReference } from '$lib/quotes/reference';
import type { ClientResponse } from '$lib/quotes/states';
import { Quote, StockUnit } from '../db';
import type { SessionUser } from '../auth/signed-in-user';
import { lateUnits, type LateUnit } from './booking-life';
import { listBookings, type BookingSummary } from './pick-lists';
import { unitsDueForTest } from './safety-tests';
import type { QuoteSummary } from '$lib/quotes/types';
import { listQuotes } from './quotes';
import { recentDeskNotices, type DeskNoticeRow } from './desk-notices';

export interface Overview {
	attention: { id: number; reference: string; eventName: string; why: string }[];
	quotes: QuoteSummary[];
	bookingsThisWeek: BookingSummary[];
	unitsInRepair: number | null;
	/** Units not back after their hire ended (staff only). */
	late: LateUnit[];
	/** Units overdue for their electrical safety test, and due within two weeks (staff only). */
	tests: { overdue: number; dueSoon: number } | null;
	/** What clients did lately (accepted, declined, asked for a change, paid): desk only. */
	notices: DeskNoticeRow[];
}

const CLIENT_ANSWER_WHY = { declined: 'The client declined it', 'change-requested': 'The client asked for a change' } as const;

export async function overviewFor(user: SessionUser): Promise<Overview> {
	const today = new Date().toISOString().slice(0, 10);
	const inAWeek = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
	const seesQuotes = can(user.role, 'quotes:read');
	const seesStock = can(user.role, 'bookings:read');
	const [late, due] = seesStock ? await Promise.all([lateUnits(today), unitsDueForTest(today)]) : [[], null];
	const isDesk = can(user.role, 'quotes:write');
	const [quotes, bookings, inRepair, flagged, notices] = await Promise.all([
		seesQuotes ? listQuotes(user, { limit: 8 }) : Promise.resolve([]),
		seesStock ? listBookings(today, { until: inAWeek }) : Promise.resolve([]),
		seesStock ? StockUnit.count({ where: { status: 'in-repair' } }) : Promise.resolve(null),
		isDesk
			? Quote.findAll({
					where: {
						[Op.or]: [{ needsRecheck: true }, { bookingIssue: { [Op.ne]: null } }, { clientResponse: { [Op.ne]: null }, status: 'draft' }],
						status: { [Op.notIn]: ['cancelled', 'closed'] }
					},
					order: [['updatedAt', 'DESC']],
					limit: 10
				})
			: Promise.resolve([]),
		isDesk ? recentDeskNotices(8) : Promise.resolve([])
	]);
	return {
		attention: flagged.map((q) => ({
			id: q.id,
			reference: quoteReference(q.id),
			eventName: q.eventName,
			why: q.bookingIssue ?? q.recheckReason ?? (q.clientResponse ? CLIENT_ANSWER_WHY[q.clientResponse as ClientResponse] : 'Needs a look')
		})),
		notices,
		quotes,
		bookingsThisWeek: bookings,
		unitsInRepair: inRepair,
		late,
		tests: due && { overdue: due.filter((d) => d.status === 'overdue').length, dueSoon: due.filter((d) => d.status === 'due-soon').length }
	};
}
