/** Client records: the organisation, its contacts (the people who sign in), its quotes and hires, its history. */
import { Op, UniqueConstraintError } from 'sequelize';
import { randomBytes } from 'node:crypto';
import { changedFields } from '$lib/clients/changes';
import { likePattern } from '$lib/clients/changes';
import { quoteReference } from '$lib/quotes/reference';
import type { QuoteStatus } from '$lib/quotes/states';
import type { ClientInput, ClientUpdateInput, ContactInput } from '$lib/schemas/clients';
import { hashPassword } from '../auth/password';
import { db, Booking, Client, ClientChange, Quote, QuoteVersion, User } from '../db';
import { userChanged, type SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';

export interface ClientSummary {
	id: number;
	name: string;
	contactName: string;
	email: string;
	phone: string | null;
	quoteCount: number;
}

export interface ClientDetail extends ClientSummary {
	billingAddress: string | null;
	taxNumber: string | null;
	notes: string | null;
	contacts: { id: number; name: string; email: string; active: boolean; lastSignInAt: string | null }[];
	quotes: { id: number; reference: string; eventName: string; status: QuoteStatus; startDate: string; endDate: string }[];
	bookings: { id: number; quoteId: number; eventName: string; status: string; startDate: string; endDate: string }[];
	history: { field: string; oldValue: string | null; newValue: string | null; changedBy: string; at: string }[];
}

const EDITABLE: (keyof ClientInput)[] = ['name', 'contactName', 'email', 'phone', 'billingAddress', 'taxNumber', 'notes'];
const blankToNull = (v: string | undefined) => (v === undefined ? undefined : v.trim() === '' ? null : v.trim());

/** Search by organisation, contact, e-mail or phone. */
export async function listClients(query?: string | null): Promise<ClientSummary[]> {
	const pattern = likePattern(query);
	const where = pattern
		? { [Op.or]: ['name', 'contactName', 'email', 'phone'].map((f) => ({ [f]: { [Op.like]: pattern } })) }
		: {};
	const clients = await Client.findAll({ where, order: [['name', 'ASC']], limit: 200 });
	const counts = await Quote.count({ where: { clientId: clients.map((c) => c.id) }, group: ['clientId'] });
	const countOf = new Map(counts.map((c) => [Number(c.clientId), Number(c.count)]));
	return clients.map((c) => summaryOf(c, countOf.get(c.id) ?? 0));
}

function summaryOf(c: Client, quoteCount: number): ClientSummary {
	return { id: c.id, name: c.name, contactName: c.contactName, email: c.email, phone: c.phone, quoteCount };
}

export async function getClient(id: number): Promise<ClientDetail> {
	const client = await Client.findByPk(id);
	if (!client) throw new DomainError(404, 'No such client.');
	const [contacts, quotes, history] = await Promise.all([
		User.findAll({ where: { clientId: id, role: 'client' }, order: [['name', 'ASC']] }),
		Quote.findAll({ where: { clientId: id }, include: [{ model: QuoteVersion, as: 'versions' }], order: [['updatedAt', 'DESC']] }),
		ClientChange.findAll({ where: { clientId: id }, order: [['id', 'DESC']], limit: 100 })
	]);
	const bookings = await Booking.findAll({ where: { quoteId: quotes.map((q) => q.id) }, order: [['startDate', 'DESC']] });
	const editors = await User.findAll({ where: { id: [...new Set(history.map((h) => h.changedById))] }, attributes: ['id', 'name'] });
	const editorName = new Map(editors.map((u) => [u.id, u.name]));
	const eventOf = new Map(quotes.map((q) => [q.id, q.eventName]));
	return {
		...summaryOf(client, quotes.length),
		billingAddress: client.billingAddress,
		taxNumber: client.taxNumber,
		notes: client.notes,
		contacts: contacts.map((u) => ({ id: u.id, name: u.name, email: u.email, active: u.active, lastSignInAt: u.lastSignInAt?.toISOString() ?? null })),
		quotes: quotes.map((q) => {
			const current = (q as Quote & { versions: QuoteVersion[] }).versions.find((v) => v.version === q.currentVersion)!;
			return { id: q.id, reference: quoteReference(q.id), eventName: q.eventName, status: q.status, startDate: current.startDate, endDate: current.endDate };
		}),
		bookings: bookings.map((b) => ({ id: b.id, quoteId: b.quoteId, eventName: eventOf.get(b.quoteId) ?? '', status: b.status, startDate: b.startDate, endDate: b.endDate })),
		history: history.map((h) => ({ field: h.field, oldValue: h.oldValue, newValue: h.newValue, changedBy: editorName.get(h.changedById) ?? 'someone', at: h.createdAt.toISOString() }))
	};
}

export async function createClient(input: ClientInput, actor: SessionUser): Promise<ClientDetail> {
	const id = await db().transaction(async (transaction) => {
		const client = await Client.create(
			{
				name: input.name,
				contactName: input.contactName,
				email: input.email,
				phone: blankToNull(input.phone) ?? null,
				billingAddress: blankToNull(input.billingAddress) ?? null,
				taxNumber: blankToNull(input.taxNumber) ?? null,
				notes: blankToNull(input.notes) ?? null
			},
			{ transaction }
		);
		await ClientChange.create({ clientId: client.id, changedById: actor.id, field: 'created', oldValue: null, newValue: client.name }, { transaction });
		return client.id;
	});
	return getClient(id);
}

/** Saves an edit and one history row per changed field, in one transaction. */
export async function updateClient(id: number, input: ClientUpdateInput, actor: SessionUser): Promise<ClientDetail> {
	await db().transaction(async (transaction) => {
		const client = await Client.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
		if (!client) throw new DomainError(404, 'No such client.');
		const next: Record<string, string | null | undefined> = {};
		for (const field of EDITABLE) next[field] = blankToNull(input[field]);
		const changes = changedFields(client.get({ plain: true }), next);
		if (changes.length === 0) return;
		await client.update(Object.fromEntries(changes.map((c) => [c.field, c.newValue])), { transaction });
		await ClientChange.bulkCreate(
			changes.map((c) => ({ clientId: id, changedById: actor.id, ...c })),
			{ transaction }
		);
	});
	return getClient(id);
}

/** Adds a person who signs in for the client; they get in by sign-in link and may then set a password. */
export async function addContact(clientId: number, input: ContactInput, actor: SessionUser): Promise<ClientDetail> {
	await saveContact(clientId, actor, async (transaction) => {
		await User.create(
			{ email: input.email, name: input.name, role: 'client', clientId, passwordHash: await hashPassword(randomBytes(24).toString('base64url')) },
			{ transaction }
		);
		return { field: 'contact added', oldValue: null, newValue: `${input.name} <${input.email}>` };
	});
	return getClient(clientId);
}

/** Corrects a contact's name or e-mail (a mistyped address is the usual reason). */
export async function updateContact(clientId: number, contactId: number, input: ContactInput, actor: SessionUser): Promise<ClientDetail> {
	await saveContact(clientId, actor, async (transaction) => {
		const user = await User.findOne({ where: { id: contactId, clientId, role: 'client' }, transaction, lock: transaction.LOCK.UPDATE });
		if (!user) throw new DomainError(404, 'No such contact for this client.');
		const before = `${user.name} <${user.email}>`;
		await user.update({ name: input.name, email: input.email }, { transaction });
		return { field: 'contact changed', oldValue: before, newValue: `${input.name} <${input.email}>` };
	});
	await userChanged();
	return getClient(clientId);
}

async function saveContact(
	clientId: number,
	actor: SessionUser,
	work: (t: import('sequelize').Transaction) => Promise<{ field: string; oldValue: string | null; newValue: string }>
) {
	try {
		await db().transaction(async (transaction) => {
			if (!(await Client.findByPk(clientId, { transaction }))) throw new DomainError(404, 'No such client.');
			const change = await work(transaction);
			await ClientChange.create({ clientId, changedById: actor.id, ...change }, { transaction });
		});
	} catch (err) {
		if (err instanceof UniqueConstraintError) {
			throw new DomainError(409, 'Someone already signs in with that e-mail.', { email: ['This e-mail is already in use'] });
		}
		throw err;
	}
}
