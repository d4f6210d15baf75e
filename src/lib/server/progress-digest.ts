/**
 * The weekly coordinator digest: apprentices at risk and why, entries waiting for journeyworkers,
 * and wage steps falling due in the next two weeks, e-mailed to every active coordinator.
 * Run by the Monday job in `schedule.ts` (claimed per week, see `sendWeeklyDigest`),
 * `npm run digest` and a button in development.
 */
import { QueryTypes } from 'sequelize';
import { sequelize, User, write } from './db';
import * as mail from './mail';
import * as progress from './progress';

/** How far ahead a wage step counts as "falling due". */
export const DUE_WITHIN_DAYS = 14;
/** Apprentices listed by name in each part; the rest are counted and left to the dashboard. */
export const LIST_LIMIT = 40;

export interface AtRisk {
	id: string;
	name: string;
	cohortName: string;
	siteName: string | null;
	reasons: string[];
}

export interface Waiting {
	journeyworkerId: string;
	journeyworker: string;
	entries: number;
	/** When the longest-waiting entry was submitted (date), and the day it records. */
	oldestSubmitted: string;
	oldestWorkDate: string;
}

export interface WageDue {
	id: string;
	name: string;
	percent: number;
	nextPercent: number;
	atHours: number;
	hoursToGo: number;
	tasksToGo: number;
	dueDate: string;
}

export interface Digest {
	weekOf: string;
	atRisk: AtRisk[];
	waiting: Waiting[];
	wageDue: WageDue[];
}

const addDays = (date: string, days: number) =>
	new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/** What this week's digest says, with a fixed number of queries whatever the head count. */
export async function gather(today = new Date().toISOString().slice(0, 10)): Promise<Digest> {
	const until = addDays(today, DUE_WITHIN_DAYS);
	const [{ rows }, waitingRows] = await Promise.all([
		progress.compute({ cohortId: null }, today),
		sequelize.query<Record<keyof Waiting, unknown>>(
			`SELECT e.supervisor_id AS "journeyworkerId", s.name AS journeyworker, COUNT(*) AS entries,
			        MIN(COALESCE(e.submitted_at, e.created_at)) AS "oldestSubmitted",
			        MIN(e.work_date) AS "oldestWorkDate"
			   FROM log_entries e
			   JOIN users s ON s.id = e.supervisor_id
			   JOIN users a ON a.id = e.apprentice_id AND a.active = :active
			  WHERE e.status = 'submitted'
			  GROUP BY e.supervisor_id, s.name
			  ORDER BY "oldestSubmitted", s.name`,
			{ type: QueryTypes.SELECT, replacements: { active: true } }
		)
	]);
	// SQLite returns stored dates as text, PostgreSQL as Date objects; both are UTC.
	const day = (v: unknown) =>
		v instanceof Date ? v.toISOString().slice(0, 10) : String(v).slice(0, 10);
	const waiting: Waiting[] = waitingRows.map((w) => ({
		journeyworkerId: String(w.journeyworkerId),
		journeyworker: String(w.journeyworker),
		entries: Number(w.entries),
		oldestSubmitted: day(w.oldestSubmitted),
		oldestWorkDate: day(w.oldestWorkDate)
	}));
	const atRisk = rows
		.filter((r) => r.progress.risk.atRisk)
		.map((r) => ({
			id: r.person.id,
			name: r.person.name,
			cohortName: r.person.cohortName,
			siteName: r.person.siteName,
			reasons: r.progress.risk.reasons
		}));
	const wageDue = rows.flatMap((r) => {
		const next = r.progress.wage.next;
		if (!next?.dueDate || next.dueDate > until) return [];
		return [
			{
				id: r.person.id,
				name: r.person.name,
				percent: r.progress.wage.percent,
				nextPercent: next.percent,
				atHours: next.atHours,
				hoursToGo: next.hoursToGo,
				tasksToGo: next.tasksToGo,
				dueDate: next.dueDate
			}
		];
	});
	wageDue.sort((a, b) => a.dueDate.localeCompare(b.dueDate) || a.name.localeCompare(b.name));
	return { weekOf: today, atRisk, waiting, wageDue };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const more = (n: number) => `…and ${n - LIST_LIMIT} more on the cohort dashboard.`;

function dueLine(w: WageDue): string {
	const what =
		w.hoursToGo > 0 ? `${w.hoursToGo} h to go to ${w.atHours} h` : `${w.atHours} h reached`;
	const tasks = w.tasksToGo > 0 ? `, and ${plural(w.tasksToGo, 'more task')} signed off` : '';
	return `${w.name}: ${w.percent} % → ${w.nextPercent} %, due ${w.dueDate} (${what}${tasks})`;
}

export function subject(d: Digest): string {
	const waiting = d.waiting.reduce((s, w) => s + w.entries, 0);
	return `Week of ${d.weekOf}: ${plural(d.atRisk.length, 'apprentice')} at risk, ${plural(waiting, 'entry', 'entries')} waiting for review`;
}

export function text(d: Digest, name: string): string {
	const lines = [`Hello ${name},`, '', `Journeymark's weekly summary for the week of ${d.weekOf}.`];
	lines.push('', `APPRENTICES AT RISK (${d.atRisk.length})`);
	if (d.atRisk.length === 0) lines.push('None this week.');
	for (const a of d.atRisk.slice(0, LIST_LIMIT)) {
		lines.push(`- ${a.name} (${a.cohortName}${a.siteName ? `, ${a.siteName}` : ''})`);
		for (const r of a.reasons) lines.push(`    ${r}`);
		lines.push(`    ${mail.link(`/coordinator/apprentices/${a.id}`)}`);
	}
	if (d.atRisk.length > LIST_LIMIT) lines.push(more(d.atRisk.length));
	lines.push('', `ENTRIES WAITING FOR REVIEW (${d.waiting.reduce((s, w) => s + w.entries, 0)})`);
	if (d.waiting.length === 0) lines.push('Every submitted entry has been reviewed.');
	for (const w of d.waiting) {
		lines.push(
			`- ${w.journeyworker}: ${plural(w.entries, 'entry', 'entries')}, oldest submitted ${w.oldestSubmitted} (work on ${w.oldestWorkDate})`
		);
	}
	lines.push(
		'',
		`WAGE STEPS FALLING DUE IN THE NEXT ${DUE_WITHIN_DAYS} DAYS (${d.wageDue.length})`
	);
	if (d.wageDue.length === 0) lines.push('None.');
	for (const w of d.wageDue.slice(0, LIST_LIMIT)) {
		lines.push(`- ${dueLine(w)}`, `    ${mail.link(`/coordinator/apprentices/${w.id}`)}`);
	}
	if (d.wageDue.length > LIST_LIMIT) lines.push(more(d.wageDue.length));
	lines.push(
		'',
		`Cohort dashboard: ${mail.link('/coordinator')}`,
		'',
		"Forecast dates follow each apprentice's recent verified hours; the local registration agency's rules govern wage steps and completion."
	);
	return lines.join('\n');
}

const escape = (s: string) =>
	s.replace(
		/[&<>"']/g,
		(c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!
	);

export function html(d: Digest, name: string): string {
	const link = (path: string, label: string) =>
		`<a href="${escape(mail.link(path))}">${escape(label)}</a>`;
	const list = (items: string[], empty: string) =>
		items.length
			? `<ul>${items
					.slice(0, LIST_LIMIT)
					.map((i) => `<li>${i}</li>`)
					.join('')}</ul>${items.length > LIST_LIMIT ? `<p>${more(items.length)}</p>` : ''}`
			: `<p>${empty}</p>`;
	const waiting = d.waiting.reduce((s, w) => s + w.entries, 0);
	return [
		`<div style="font-family: Lato, Arial, sans-serif; color: #1b2430; max-width: 40em">`,
		`<p>Hello ${escape(name)},</p>`,
		`<p>Journeymark's weekly summary for the week of ${escape(d.weekOf)}.</p>`,
		`<h2 style="font-size: 1.1em">Apprentices at risk (${d.atRisk.length})</h2>`,
		list(
			d.atRisk.map(
				(a) =>
					`${link(`/coordinator/apprentices/${a.id}`, a.name)} (${escape(a.cohortName)}${a.siteName ? `, ${escape(a.siteName)}` : ''}): ${a.reasons.map(escape).join(' ')}`
			),
			'None this week.'
		),
		`<h2 style="font-size: 1.1em">Entries waiting for review (${waiting})</h2>`,
		list(
			d.waiting.map(
				(w) =>
					`${escape(w.journeyworker)}: ${plural(w.entries, 'entry', 'entries')}, oldest submitted ${escape(w.oldestSubmitted)}`
			),
			'Every submitted entry has been reviewed.'
		),
		`<h2 style="font-size: 1.1em">Wage steps falling due in the next ${DUE_WITHIN_DAYS} days (${d.wageDue.length})</h2>`,
		list(
			d.wageDue.map((w) => link(`/coordinator/apprentices/${w.id}`, dueLine(w))),
			'None.'
		),
		`<p>${link('/coordinator', 'Open the cohort dashboard')}</p>`,
		`<p style="color: #4a5565; font-size: 0.9em">Forecast dates follow each apprentice's recent verified hours; the local registration agency's rules govern wage steps and completion.</p>`,
		`</div>`
	].join('\n');
}

/**
 * Sends this week's digest to every active coordinator, whether or not it went out already;
 * returns how many were sent. `onSent` runs after each message.
 */
export async function sendCoordinatorDigests(
	now = new Date(),
	onSent?: () => void
): Promise<number> {
	const today = now.toISOString().slice(0, 10);
	const [digest, coordinators] = await Promise.all([
		gather(today),
		User.findAll({
			where: { role: 'coordinator', active: true },
			attributes: ['email', 'name'],
			order: [['name', 'ASC']]
		})
	]);
	for (const c of coordinators) {
		await mail.send({
			to: c.email,
			subject: subject(digest),
			text: text(digest, c.name),
			html: html(digest, c.name)
		});
		onSent?.();
	}
	return coordinators.length;
}

/** The Monday (server local time) of the week `now` falls in, as YYYY-MM-DD. */
export function weekOf(now = new Date()): string {
	const monday = new Date(
		now.getFullYear(),
		now.getMonth(),
		now.getDate() - ((now.getDay() + 6) % 7)
	);
	const pad = (n: number) => String(n).padStart(2, '0');
	return `${monday.getFullYear()}-${pad(monday.getMonth() + 1)}-${pad(monday.getDate())}`;
}

/**
 * Sends this week's digest unless it already went out this week: the week's row in
 * `coordinator_digests` is claimed first, so of several instances (or scheduler runs) only the
 * first sends. Returns how many were sent, or null when the week was already claimed. A claim
 * whose sending failed before any message went out is released, so a later run retries.
 */
export async function sendWeeklyDigest(now = new Date()): Promise<number | null> {
	const week = weekOf(now);
	// ON CONFLICT DO NOTHING rather than a caught error: PostgreSQL aborts a transaction on errors.
	// The leading comment keeps Sequelize's SQLite driver from dropping the RETURNING row.
	const claimed = await write((transaction) =>
		sequelize.query<{ week: string }>(
			`/* claim */ INSERT INTO coordinator_digests (week, claimed_at) VALUES (:week, :now)
			 ON CONFLICT (week) DO NOTHING RETURNING week`,
			{ replacements: { week, now }, type: QueryTypes.SELECT, transaction }
		)
	);
	if (claimed.length === 0) return null;
	let sent = 0;
	try {
		sent = await sendCoordinatorDigests(now, () => sent++);
	} catch (err) {
		if (sent === 0) {
			await write((transaction) =>
				sequelize.query('DELETE FROM coordinator_digests WHERE week = :week', {
					replacements: { week },
					transaction
				})
			);
		}
		throw err;
	}
	await write((transaction) =>
		sequelize.query('UPDATE coordinator_digests SET recipients = :sent WHERE week = :week', {
			replacements: { sent, week },
			transaction
		})
	);
	return sent;
}
