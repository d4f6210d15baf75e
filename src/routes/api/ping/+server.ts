import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';

/** The smallest JSON route of the app: the bench's baseline for /api/verify. */
export const GET = (() => json({ ok: true })) satisfies RequestHandler;
