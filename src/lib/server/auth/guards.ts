import { error, redirect } from '@sveltejs/kit';
import { can, type Capability } from '$lib/permissions';
import type { SessionUser } from './signed-in-user';

type GuardEvent = { locals: Pick<App.Locals, 'user'>; url: URL };

/**
 * The security boundary: every load, action and API handler calls this first with the capability
 * it needs (see `CAPABILITIES` in $lib/permissions). Signed out: 401 for the API, a redirect to
 * sign-in for pages. A role without any of the capabilities: 403.
 */
export function requireCapability(event: GuardEvent, ...capabilities: Capability[]): SessionUser {
	const user = event.locals.user;
	if (!user) {
		if (event.url.pathname.startsWith('/api/')) error(401, { message: 'Sign in first.' });
		const target = event.url.pathname + event.url.search;
		redirect(303, `/signin?redirectTo=${encodeURIComponent(target)}`);
	}
	if (capabilities.length > 0 && !capabilities.some((c) => can(user.role, c))) {
		error(403, { message: 'Your role does not give access to this.' });
	}
	return user;
}

/** Any signed-in person, whatever the role. */
export function requireUser(event: GuardEvent): SessionUser {
	return requireCapability(event);
}
