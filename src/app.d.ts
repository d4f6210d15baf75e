// See https://svelte.dev/docs/kit/types#app.d.ts
declare global {
	namespace App {
		interface Locals {
			user: import('lucia').User | null;
			session: import('lucia').Session | null;
		}
		interface Error {
			message: string;
			/** Quoted to the user so an unexpected failure can be found in the log. */
			errorId?: string;
		}
	}
}

export {};
