import * as digest from './progress-digest';
import * as worklog from './worklog';

const EVERY_MS = 15 * 60_000;

/**
 * Daily jobs: from `digestHour` (server local time) each journeyworker with entries waiting gets
 * one review digest. Checking every 15 minutes is cheap; the database decides who was already sent.
 * On Mondays from the same hour the coordinators get their weekly progress digest, once per
 * process: without a claim row in the database, run it from one instance only (or use
 * `npm run digest` from the host's scheduler and switch these jobs off with DAILY_JOBS=off).
 */
export function startDailyJobs(digestHour = Number(process.env.DIGEST_HOUR ?? 6)) {
	let weeklySentOn: string | null = null;
	const tick = async () => {
		const now = new Date();
		if (now.getHours() < digestHour) return;
		try {
			await worklog.sendReviewDigests();
		} catch (err) {
			console.error('Sending review digests failed', err);
		}
		const day = now.toDateString();
		if (now.getDay() === 1 && weeklySentOn !== day) {
			weeklySentOn = day;
			try {
				await digest.sendCoordinatorDigests(now);
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
