/**
 * Per-address limit on public certificate lookups: a fixed one-minute window counted in memory.
 * Kept out of the database on purpose: a write per lookup would cost more than the lookup, and
 * the limit only has to slow down someone walking through serials, not survive a restart.
 */
import { config } from '../config';

const WINDOW_MS = 60_000;
const MAX_TRACKED = 50_000;

export class LookupLimiter {
	#windows = new Map<string, { start: number; count: number }>();

	constructor(readonly perMinute: number) {}

	/** Seconds to wait before the next lookup from `address`, or 0 when it may go ahead. */
	take(address: string, now = Date.now()): number {
		let window = this.#windows.get(address);
		if (!window || now - window.start >= WINDOW_MS) {
			if (this.#windows.size >= MAX_TRACKED) this.#sweep(now);
			window = { start: now, count: 0 };
			this.#windows.set(address, window);
		}
		window.count++;
		if (window.count <= this.perMinute) return 0;
		return Math.max(1, Math.ceil((window.start + WINDOW_MS - now) / 1000));
	}

	#sweep(now: number) {
		for (const [key, w] of this.#windows) if (now - w.start >= WINDOW_MS) this.#windows.delete(key);
		if (this.#windows.size >= MAX_TRACKED) this.#windows.clear();
	}
}

/** The limiter of this process for /verify and /api/verify. */
export const verifyLimiter = new LookupLimiter(config.VERIFY_LOOKUPS_PER_MINUTE);
