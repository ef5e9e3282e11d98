import type { Role } from '$lib/permissions';

/** A person's account as the admin's user list shows it. */
export interface UserRow {
	id: number;
	email: string;
	name: string;
	role: Role;
	active: boolean;
	clientId: number | null;
	clientName: string | null;
	lastSignInAt: string | null;
	createdAt: string;
}
