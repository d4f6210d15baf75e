import * as worklog from './worklog';

const EVERY_MS = 15 * 60_000;

/**
 * Daily jobs: from `digestHour` (server local time) each journeyworker with entries waiting gets
 * one review digest. Checking every 15 minutes is cheap; the database decides who was already sent.
 */
export function startDailyJobs(digestHour = Number(process.env.DIGEST_HOUR ?? 6)) {
	const tick = async () => {
		if (new Date().getHours() < digestHour) return;
		try {
			await worklog.sendReviewDigests();
		} catch (err) {
			console.error('Sending review digests failed', err);
		}
	};
	const timer = setInterval(tick, EVERY_MS);
	timer.unref();
	void tick();
	return () => clearInterval(timer);
}
