import { requireUser } from '$lib/server/auth/guards';
import { navigationFor, ROLE_LABELS } from '$lib/permissions';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = async (event) => {
	const user = requireUser(event);
	return {
		user: { name: user.name, email: user.email, role: user.role, roleLabel: ROLE_LABELS[user.role] },
		navigation: navigationFor(user.role)
	};
};
