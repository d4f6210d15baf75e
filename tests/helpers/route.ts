/**
 * Calls a `+server.ts` handler the way SvelteKit would, with a signed-in user (or none), and
 * turns `error()` throws into the response the app would send.
 */
export async function call(
	handler: (event: never) => Response | Promise<Response>,
	params: Record<string, string>,
	extra: Record<string, unknown> = {}
): Promise<Response> {
	try {
		return await handler({
			params,
			url: new URL('http://localhost:3999/api/x'),
			getClientAddress: () => extra.address ?? '203.0.113.9',
			locals: { user: extra.user ?? null },
			...extra
		} as never);
	} catch (err) {
		const e = err as { status?: number; body?: { message: string } };
		if (typeof e.status === 'number') {
			return new Response(JSON.stringify(e.body), { status: e.status });
		}
		throw err;
	}
}
