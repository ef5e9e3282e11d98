/** The overview page: what each role should look at first. */
import { Op } from 'sequelize';
import { quoteReference } from '$lib/quotes/reference';
import { Quote, StockUnit } from '../db';
import type { SessionUser } from '../users';
import { listBookings, type BookingSummary } from './pick-lists';
import { listQuotes, type QuoteSummary } from './quotes';

export interface Overview {
	attention: { id: number; reference: string; eventName: string; why: string }[];
	quotes: QuoteSummary[];
	goingOut: BookingSummary[];
	unitsInRepair: number | null;
}

export async function overviewFor(user: SessionUser): Promise<Overview> {
	const today = new Date().toISOString().slice(0, 10);
	const inAWeek = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
	const seesQuotes = user.role !== 'warehouse';
	const seesStock = user.role !== 'client';
	const [quotes, bookings, inRepair, flagged] = await Promise.all([
		seesQuotes ? listQuotes(user, { limit: 8 }) : Promise.resolve([]),
		seesStock ? listBookings(today, { until: inAWeek }) : Promise.resolve([]),
		seesStock ? StockUnit.count({ where: { status: 'in-repair' } }) : Promise.resolve(null),
		user.role === 'sales' || user.role === 'admin'
			? Quote.findAll({ where: { [Op.or]: [{ needsRecheck: true }, { bookingIssue: { [Op.ne]: null } }], status: { [Op.notIn]: ['cancelled', 'closed'] } }, order: [['updatedAt', 'DESC']], limit: 10 })
			: Promise.resolve([])
	]);
	return {
		attention: flagged.map((q) => ({
			id: q.id,
			reference: quoteReference(q.id),
			eventName: q.eventName,
			why: q.bookingIssue ?? q.recheckReason ?? 'Needs a look'
		})),
		quotes,
		goingOut: bookings,
		unitsInRepair: inRepair
	};
}
