import { requireUser } from '$lib/server/auth/guards';
import { navigationFor, ROLE_LABELS } from '$lib/permissions';
import { hasChosenPassword } from '$lib/server/services/users';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async (event) => {
	const user = requireUser(event);
	return {
		user: { name: user.name, email: user.email, role: user.role, roleLabel: ROLE_LABELS[user.role] },
		navigation: navigationFor(user.role),
		// A client who came in by link and has no password yet is asked to choose one.
		needsPassword: user.role === 'client' && !(await hasChosenPassword(user.id))
	};
};
