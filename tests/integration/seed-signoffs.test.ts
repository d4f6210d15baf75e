import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { verify } from '$lib/server/audit';
import { signatureDigest, signOffProblems } from '$lib/server/assessment/gates';
import { prepare, sequelize, SignOff, type StepResult } from '$lib/server/db';
import { ensureDefault } from '$lib/server/framework';
import { seedDemo } from '../../seed/demo';
import {
	generateSignOffs,
	loadSignOffInput,
	SEED_SESSION_HASH,
	seedSignOffs,
	type SignOffCounts
} from '../../seed/signoffs';
import { seedWorkLog } from '../../seed/worklog';

// A fixed moment, so the scenario (and these checks) never depend on the day the suite runs.
const TODAY = new Date('2026-12-02T15:00:00Z');
const BEA = 'bea.kowalczyk@riverbend-training.example';
const GUS = 'gus.takahashi@riverbend-training.example';
const NIA = 'nia.obuya@riverbend-training.example';

const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
	sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

// Standing records: sign-offs and corrections nothing later revoked or corrected.
const LEVELS = `
	WITH standing AS (
	  SELECT s.* FROM sign_offs s WHERE s.kind IN ('sign-off', 'correction')
	     AND NOT EXISTS (SELECT 1 FROM sign_offs r WHERE r.refers_to_id = s.id)),
	levels AS (SELECT apprentice_id, task_id, MAX(level) AS level FROM standing GROUP BY 1, 2)`;

let counts: SignOffCounts | 'already seeded';

beforeAll(async () => {
	await prepare();
	await ensureDefault();
	expect(await seedDemo()).toBe('seeded');
	await seedWorkLog(TODAY);
	const started = Date.now();
	counts = await seedSignOffs(TODAY);
	// A few big batches, not thousands of single inserts.
	expect(Date.now() - started).toBeLessThan(15_000);
}, 60_000);

describe('demo sign-offs', () => {
	it('stores checks, sign-offs and one audit event each, once', async () => {
		expect(counts).not.toBe('already seeded');
		if (counts === 'already seeded') return;
		expect(counts.signOffs).toBeGreaterThan(1_000);
		expect(counts.auditEvents).toBe(counts.signOffs);
		expect(await SignOff.count()).toBe(counts.signOffs);
		expect(await seedSignOffs(TODAY)).toBe('already seeded');
		expect(await SignOff.count()).toBe(counts.signOffs);
		const kinds = await select<{ kind: string; n: number }>(
			'SELECT kind, COUNT(*) AS n FROM sign_offs GROUP BY kind ORDER BY kind'
		);
		expect(kinds.map((k) => [k.kind, k.n > 0 ? 'some' : 0])).toEqual([
			['correction', 'some'],
			['revocation', 'some'],
			['sign-off', 'some']
		]);
		expect(kinds.find((k) => k.kind !== 'sign-off' && k.n !== 1)).toBeUndefined();
	});

	it('passes every gate of signOff() at the moment each sign-off was made', async () => {
		const rows = await select<{
			id: number;
			level: 1 | 2 | 3 | 4;
			results: string | Record<string, StepResult>;
			verifiedTenths: number;
			signedAt: string;
			requiredLevel: 1 | 2 | 3 | 4;
			minHours: number;
			taskId: number;
			hoursThen: number | null;
			// Booleans: 0 or 1 from SQLite, true or false from PostgreSQL.
			quizOk: number | boolean;
			assigned: number | boolean;
			qualified: number | boolean;
			self: number | boolean;
			sessionHash: string;
		}>(
			`SELECT s.id, s.level, s.results, s.verified_tenths AS "verifiedTenths", s.signed_at AS "signedAt",
			        t.required_level AS "requiredLevel", t.min_hours AS "minHours", t.id AS "taskId",
			        (SELECT SUM(lt.tenths) FROM log_entry_tasks lt JOIN log_entries e ON e.id = lt.entry_id
			          WHERE e.apprentice_id = s.apprentice_id AND lt.task_id = s.task_id
			            AND e.status = 'verified' AND e.reviewed_at <= s.signed_at) AS "hoursThen",
			        EXISTS (SELECT 1 FROM quiz_attempts q WHERE q.id = s.quiz_attempt_id AND q.passed
			                 AND q.apprentice_id = s.apprentice_id AND q.task_id = s.task_id
			                 AND q.submitted_at < s.signed_at) AS "quizOk",
			        EXISTS (SELECT 1 FROM supervisions v WHERE v.apprentice_id = s.apprentice_id
			                 AND v.supervisor_id = s.supervisor_id) AS assigned,
			        EXISTS (SELECT 1 FROM supervisor_profiles p WHERE p.user_id = s.supervisor_id) AS qualified,
			        s.supervisor_id = s.apprentice_id AS self, s.session_hash AS "sessionHash"
			   FROM sign_offs s JOIN framework_tasks t ON t.id = s.task_id
			  WHERE s.kind = 'sign-off'`
		);
		const steps = await select<{ taskId: number; id: number; safety: number | boolean }>(
			'SELECT task_id AS "taskId", id, safety FROM task_steps ORDER BY task_id, position'
		);
		for (const row of rows) {
			expect(row.verifiedTenths, `sign-off ${row.id}`).toBe(row.hoursThen);
			expect(new Date(row.signedAt).getTime()).toBeLessThanOrEqual(TODAY.getTime());
			expect(row.sessionHash).toBe(SEED_SESSION_HASH);
			const problems = signOffProblems({
				level: row.level,
				requiredLevel: row.requiredLevel,
				minHours: row.minHours,
				verifiedTenths: row.verifiedTenths,
				quizPassed: !!row.quizOk,
				checklist: steps
					.filter((s) => s.taskId === row.taskId)
					.map((s) => ({ stepId: s.id, safety: !!s.safety })),
				// A JSON column: text from SQLite, already parsed by PostgreSQL.
				results:
					typeof row.results === 'string'
						? (JSON.parse(row.results) as Record<string, StepResult>)
						: row.results,
				supervisorAssigned: !!row.assigned,
				supervisorQualified: !!row.qualified,
				selfSignOff: !!row.self
			});
			expect(problems, `sign-off ${row.id}`).toEqual({});
		}
	});

	it('raises levels over time, task by task, and seals each record like the app', async () => {
		const rows = await SignOff.findAll({ order: [['id', 'ASC']] });
		const held = new Map<string, { level: number; at: number }>();
		let lastAt = 0;
		for (const s of rows) {
			// Ids follow time, so the audit chain reads as the history happened.
			expect(s.signedAt.getTime()).toBeGreaterThanOrEqual(lastAt);
			lastAt = s.signedAt.getTime();
			if (s.kind !== 'sign-off') continue;
			const key = `${s.apprenticeId}|${s.taskId}`;
			const before = held.get(key);
			if (before) {
				expect(s.level).toBeGreaterThan(before.level);
				expect(lastAt - before.at).toBeGreaterThanOrEqual(14 * 86_400_000);
			}
			held.set(key, { level: s.level!, at: lastAt });
		}
		const [audit] = await select<{ content: string }>(
			`SELECT content FROM audit_events WHERE kind = 'sign-off.made' ORDER BY id LIMIT 1`
		);
		const made = JSON.parse(audit.content) as Record<string, unknown>;
		const first = rows.find((r) => `sign-off:${r.id}` === made.subject)!;
		const { contentHash, kind, subject, actorId, at, ...signed } = made;
		expect([kind, actorId, at]).toEqual([
			'sign-off.made',
			first.supervisorId,
			first.signedAt.toISOString()
		]);
		expect(subject).toBe(`sign-off:${first.id}`);
		expect(contentHash).toBe(first.contentHash);
		expect(signatureDigest(signed)).toBe(first.contentHash);
	});

	it('revokes one sign-off and corrects another, by the coordinator, pointing back', async () => {
		const rows = await select<{
			kind: string;
			role: string;
			refersKind: string;
			refersLevel: number;
			level: number | null;
			reason: string;
			audited: number;
		}>(
			`SELECT s.kind, u.role, o.kind AS "refersKind", o.level AS "refersLevel", s.level, s.reason,
			        (SELECT COUNT(*) FROM audit_events a WHERE a.subject = 'sign-off:' || o.id
			            AND a.kind = CASE s.kind WHEN 'revocation' THEN 'sign-off.revoked' ELSE 'sign-off.corrected' END) AS audited
			   FROM sign_offs s JOIN sign_offs o ON o.id = s.refers_to_id JOIN users u ON u.id = s.supervisor_id
			  ORDER BY s.kind`
		);
		expect(rows).toHaveLength(2);
		for (const r of rows) {
			expect(r.role).toBe('coordinator');
			expect(r.refersKind).toBe('sign-off');
			expect(r.reason.length).toBeGreaterThan(20);
			expect(r.audited).toBe(1);
		}
		const [correction, revocation] = rows;
		expect(correction.level).toBe(correction.refersLevel - 1);
		expect(revocation.level).toBeNull();
	});

	it('keeps the audit chain intact', async () => {
		const result = await verify();
		expect(result).toEqual({
			ok: true,
			count: counts === 'already seeded' ? -1 : counts.auditEvents
		});
	});

	it('tells the story: Bea completes shop safety and another area, Nia behind, Gus stalled', async () => {
		const areas = await select<{ area: string; tasks: number; done: number }>(
			`${LEVELS}
			 SELECT a.code AS area, COUNT(*) AS tasks,
			        COUNT(CASE WHEN COALESCE(l.level, 0) >= t.required_level THEN 1 END) AS done
			   FROM framework_tasks t JOIN framework_areas a ON a.id = t.area_id
			   LEFT JOIN levels l ON l.task_id = t.id AND l.apprentice_id = (SELECT id FROM users WHERE email = :bea)
			  GROUP BY a.code`,
			{ bea: BEA }
		);
		const complete = areas.filter((a) => a.done === a.tasks).map((a) => a.area);
		expect(complete).toContain('SAF');
		expect(complete.length).toBeGreaterThanOrEqual(2);

		const people = await select<{ email: string; done: number; last: string | null }>(
			`${LEVELS}
			 SELECT u.email,
			        (SELECT COUNT(*) FROM levels l JOIN framework_tasks t ON t.id = l.task_id
			          WHERE l.apprentice_id = u.id AND l.level >= t.required_level) AS done,
			        (SELECT MAX(signed_at) FROM sign_offs s WHERE s.apprentice_id = u.id) AS last
			   FROM apprentice_profiles p JOIN users u ON u.id = p.user_id`
		);
		const done = (email: string) => people.find((p) => p.email === email)!.done;
		const others = people.filter((p) => ![BEA, NIA, GUS].includes(p.email)).map((p) => p.done);
		expect(done(BEA)).toBeGreaterThan(Math.max(...others));
		expect(done(NIA)).toBeLessThan(Math.min(...others));
		// Partial: everyone else has some tasks complete and is well short of the 132.
		for (const n of others) expect(n).toBeGreaterThan(5);
		for (const n of others) expect(n).toBeLessThan(80);
		const gusLast = people.find((p) => p.email === GUS)!.last!;
		expect(gusLast < '2026-10-31').toBe(true);
	});

	it('is deterministic: the same people, work and day give the same records', async () => {
		const input = (await loadSignOffInput(TODAY))!;
		const first = generateSignOffs(input);
		expect(generateSignOffs(input)).toEqual(first);
		const shuffled = generateSignOffs({
			...input,
			apprentices: [...input.apprentices].reverse(),
			tasks: [...input.tasks].reverse(),
			work: [...input.work].reverse()
		});
		expect(shuffled).toEqual(first);
		const [stored] = await select<{ n: number; levels: number; last: string }>(
			`SELECT COUNT(*) AS n, SUM(level) AS levels,
			        (SELECT hash FROM audit_events ORDER BY id DESC LIMIT 1) AS last FROM sign_offs`
		);
		expect(stored).toEqual({
			n: first.signOffs.length,
			levels: first.signOffs.reduce((sum, s) => sum + (s.level ?? 0), 0),
			last: first.audit[first.audit.length - 1].hash
		});
	});
});
