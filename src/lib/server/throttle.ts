import { LoginThrottle, write } from './db';

/** Failed sign-ins allowed per window before a pause (common practice, no published source). */
export const LIMITS = {
	account: { failures: 5, windowMinutes: 15, blockMinutes: 15 },
	address: { failures: 20, windowMinutes: 15, blockMinutes: 15 }
} as const;

type Scope = keyof typeof LIMITS;

const keyOf = (scope: Scope, value: string) => `${scope}:${value.toLowerCase()}`;

/** Seconds until sign-in is allowed again for any of the keys, or 0. */
export async function retryAfter(keys: [Scope, string][], now = new Date()): Promise<number> {
	const rows = await LoginThrottle.findAll({ where: { key: keys.map(([s, v]) => keyOf(s, v)) } });
	const until = Math.max(0, ...rows.map((r) => r.blockedUntil?.getTime() ?? 0));
	return until > now.getTime() ? Math.ceil((until - now.getTime()) / 1000) : 0;
}

export async function recordFailure(keys: [Scope, string][], now = new Date()) {
	await write(async (transaction) => {
		for (const [scope, value] of keys) {
			const limit = LIMITS[scope];
			const key = keyOf(scope, value);
			const row = await LoginThrottle.findByPk(key, { transaction });
			const windowOpen =
				row && now.getTime() - row.windowStart.getTime() < limit.windowMinutes * 60_000;
			const failures = windowOpen ? row.failures + 1 : 1;
			const blockedUntil =
				failures >= limit.failures ? new Date(now.getTime() + limit.blockMinutes * 60_000) : null;
			await LoginThrottle.upsert(
				{ key, failures, windowStart: windowOpen ? row.windowStart : now, blockedUntil },
				{ transaction }
			);
		}
	});
}

export async function clear(scope: Scope, value: string) {
	await write((transaction) =>
		LoginThrottle.destroy({ where: { key: keyOf(scope, value) }, transaction })
	);
}
