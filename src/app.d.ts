import type { Role } from '$lib/permissions';

declare global {
	namespace App {
		interface Error {
			message: string;
			errors?: Record<string, string[]>;
		}
		interface Locals {
			user: { id: number; role: Role; clientId: number | null; name: string; email: string } | null;
		}
		// interface PageData {}
		// interface PageState {}
		// interface Platform {}
	}
}

export {};
