import type { SubmitFunction } from '@sveltejs/kit';
import { goto } from '$app/navigation';

/** After a small edit, keep focus and scroll where the coordinator is working. */
export const stay: SubmitFunction = () => {
	return async ({ result, update }) => {
		if (result.type === 'redirect') {
			await goto(result.location, { invalidateAll: true, keepFocus: true, noScroll: true });
		} else {
			await update({ reset: false });
		}
	};
};
