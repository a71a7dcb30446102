import type { Actor } from '$lib/server/access';

declare global {
	namespace App {
		interface Error {
			message: string;
			id?: string;
		}
		interface Locals {
			/** The signed-in user (session cookie or API token), or null. */
			actor: Actor | null;
		}
		// interface PageData {}
		// interface PageState {}
		// interface Platform {}
	}
}

export {};
