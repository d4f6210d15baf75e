import * as digest from './progress-digest';
import * as worklog from './worklog';

const EVERY_MS = 15 * 60_000;

/**
 * Daily jobs: from `digestHour` (server local time) each journeyworker with entries waiting gets
 * one review digest. Checking every 15 minutes is cheap; the database decides who was already sent.
 * On Mondays from the same hour the coordinators get their weekly progress digest; the week is
 * claimed in the database, so of several instances only one sends. `weekDone` only saves this
 * process a query per tick once it has seen the week claimed.
 */
export function startDailyJobs(digestHour = Number(process.env.DIGEST_HOUR ?? 6)) {
	let weekDone: string | null = null;
	const tick = async () => {
		const now = new Date();
		if (now.getHours() < digestHour) return;
		try {
			await worklog.sendReviewDigests();
		} catch (err) {
			console.error('Sending review digests failed', err);
		}
		const week = digest.weekOf(now);
		if (now.getDay() === 1 && weekDone !== week) {
			try {
				await digest.sendWeeklyDigest(now);
				weekDone = week;
			} catch (err) {
				console.error('Sending the weekly coordinator digest failed', err);
			}
		}
	};
	const timer = setInterval(tick, EVERY_MS);
	timer.unref();
	void tick();
	return () => clearInterval(timer);
}
