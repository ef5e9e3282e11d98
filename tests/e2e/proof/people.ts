/** The people the proof suite acts as, and their session cookies. */
import { sessionCookie } from '../http';
import { ADMIN, SALES, WAREHOUSE } from '../../helpers/demo-accounts';

export const ROLES = ['out', 'admin', 'warehouse', 'sales', 'client', 'stranger'] as const;
export type Role = (typeof ROLES)[number];

/** `client` owns the quotes the suite makes; `stranger` is another client organisation's account. */
export const EMAILS: Record<Exclude<Role, 'out'>, string> = {
	admin: ADMIN,
	warehouse: WAREHOUSE,
	sales: SALES,
	client: 'organiser@millbrook-riverside.test',
	stranger: 'events@st-aldric.test'
};

export type Sessions = Record<Role, string | undefined>;

export async function signInEveryone(): Promise<Sessions> {
	const sessions: Sessions = {
		out: undefined,
		admin: '',
		warehouse: '',
		sales: '',
		client: '',
		stranger: ''
	};
	for (const role of ROLES) if (role !== 'out') sessions[role] = await sessionCookie(EMAILS[role]);
	return sessions;
}
