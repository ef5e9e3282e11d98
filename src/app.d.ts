import type { SessionUser } from '$lib/server/auth/signed-in-user';

declare global {
	namespace App {
		interface Error {
			message: string;
			errors?: Record<string, string[]>;
		}
		interface Locals {
			user: SessionUser | null;
		}
		// interface PageData {}
		// interface PageState {}
		// interface Platform {}
	}
}

export {};
