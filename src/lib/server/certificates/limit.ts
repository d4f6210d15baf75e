/**
 * Per-address limit on public certificate lookups, in fixed one-minute windows.
 *
 * Two stores: `SharedLookupLimiter` counts in the database, so every app instance sees the same
 * counts; `LookupLimiter` counts in memory. The limiter of the app uses the database when it is
 * PostgreSQL (several instances may share it) and memory on SQLite: a SQLite file serves one
 * instance, and a write per lookup through its single write queue would cost more than the
 * lookup itself. The limit only has to slow down someone walking through serials, not survive a
 * restart.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { config } from '../config';

const WINDOW_MS = 60_000;
const MAX_TRACKED = 50_000;
/** How often one process deletes finished windows from the database. */
const SWEEP_EVERY_MS = 60_000;
/** Longest address kept (the column is 100 characters). */
const ADDRESS_MAX = 100;

export interface LookupStore {
	/** Seconds to wait before the next lookup from `address`, or 0 when it may go ahead. */
	take(address: string, now?: number): number | Promise<number>;
}

/** Counts in memory: one process only. */
export class LookupLimiter implements LookupStore {
	#windows = new Map<string, { start: number; count: number }>();

	constructor(readonly perMinute: number) {}

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

export interface LimiterDatabase {
	sequelize: Sequelize;
	write: <T>(work: (transaction: Transaction) => Promise<T>) => Promise<T>;
}

/**
 * Counts in `verify_lookups`, one row per address and clock minute, so instances sharing the
 * database share the limit. One upsert per lookup; finished windows are deleted about once a
 * minute per process.
 */
export class SharedLookupLimiter implements LookupStore {
	#lastSweep = 0;

	constructor(
		readonly perMinute: number,
		private readonly db: LimiterDatabase
	) {}

	/**
	 * Each statement is atomic on its own. On PostgreSQL it runs outside `write()`, whose
	 * app-wide lock public lookups should not queue behind; SQLite needs the write queue.
	 */
	#run<T>(work: (transaction: Transaction | undefined) => Promise<T>): Promise<T> {
		if (this.db.sequelize.getDialect() === 'postgres') return work(undefined);
		return this.db.write(work);
	}

	async take(address: string, now = Date.now()): Promise<number> {
		const minute = Math.floor(now / WINDOW_MS);
		if (now - this.#lastSweep >= SWEEP_EVERY_MS) {
			this.#lastSweep = now;
			this.sweep(now).catch((err) => console.error('Clearing old lookup counts failed', err));
		}
		// The leading comment keeps Sequelize's SQLite driver from taking this for a plain INSERT
		// and dropping the RETURNING row.
		const rows = await this.#run((transaction) =>
			this.db.sequelize.query<{ lookups: number | string }>(
				`/* count */ INSERT INTO verify_lookups (address, minute, lookups) VALUES (:address, :minute, 1)
				 ON CONFLICT (address, minute) DO UPDATE SET lookups = verify_lookups.lookups + 1
				 RETURNING lookups`,
				{
					replacements: { address: address.slice(0, ADDRESS_MAX), minute },
					type: QueryTypes.SELECT,
					transaction
				}
			)
		);
		if (Number(rows[0]?.lookups ?? 1) <= this.perMinute) return 0;
		return Math.max(1, Math.ceil(((minute + 1) * WINDOW_MS - now) / 1000));
	}

	/** Deletes the windows that ended before the previous minute. */
	async sweep(now = Date.now()): Promise<void> {
		const minute = Math.floor(now / WINDOW_MS);
		await this.#run((transaction) =>
			this.db.sequelize.query('DELETE FROM verify_lookups WHERE minute < :before', {
				replacements: { before: minute - 1 },
				transaction
			})
		);
	}
}

let chosen: Promise<LookupStore> | undefined;

/** The store the app uses: shared through PostgreSQL, in memory on SQLite (see above). */
function store(): Promise<LookupStore> {
	chosen ??= import('../db').then((db) =>
		db.sequelize.getDialect() === 'postgres'
			? new SharedLookupLimiter(config.VERIFY_LOOKUPS_PER_MINUTE, db)
			: new LookupLimiter(config.VERIFY_LOOKUPS_PER_MINUTE)
	);
	return chosen;
}

/** The limiter for /verify and /api/verify. */
export const verifyLimiter = {
	async take(address: string): Promise<number> {
		return (await store()).take(address);
	}
};
