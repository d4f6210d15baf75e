import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { prepare, sequelize } from '$lib/server/db';

export const GET = (async () => {
	try {
		await prepare();
		await sequelize.query('SELECT 1');
		return json({ ok: true });
	} catch {
		return json({ ok: false }, { status: 503 });
	}
}) satisfies RequestHandler;
