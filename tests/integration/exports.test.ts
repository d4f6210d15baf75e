import { parse } from 'csv-parse/sync';
import { PDFDocument } from 'pdf-lib';
import { Op } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import * as assessment from '$lib/server/assessment';
import type { SignedInUser } from '$lib/server/auth';
import { ApprenticeProfile, Cohort, prepare, sequelize, Task, User } from '$lib/server/db';
import { safeCell } from '$lib/server/exports/csv';
import * as framework from '$lib/server/framework';
import * as progress from '$lib/server/progress';
import * as rti from '$lib/server/worklog/rti';
import { seedDemo } from '../../seed/demo';
import { GET as apprenticeCsvGet } from '../../src/routes/api/apprentices/[id]/record.csv/+server';
import { GET as apprenticePdfGet } from '../../src/routes/api/apprentices/[id]/record.pdf/+server';
import { GET as cohortCsvGet } from '../../src/routes/api/cohorts/[id]/record.csv/+server';
import { GET as cohortPdfGet } from '../../src/routes/api/cohorts/[id]/record.pdf/+server';
import { byRole } from '../helpers/accounts';
import * as records from '../helpers/records';

type Handler = (event: never) => Promise<Response>;
type Row = Record<string, string>;

let apprentice: SignedInUser;
let supervisor: SignedInUser;
let coordinator: SignedInUser;
let cohortId: number;
let otherCohortId: number;
const INJECTED = '=HYPERLINK("http://attacker.invalid","click")';

/** Calls a route handler as SvelteKit would; an `error()` thrown inside becomes its status. */
async function call(handler: Handler, id: string, user: SignedInUser | null) {
	const event = {
		params: { id },
		locals: { user, session: null },
		url: new URL(`http://localhost:3999/api/x/${id}/record`)
	};
	try {
		return await handler(event as never);
	} catch (err) {
		const status = (err as { status?: number }).status;
		if (typeof status === 'number') return new Response(null, { status });
		throw err;
	}
}

const rows = async (response: Response): Promise<Row[]> =>
	parse(Buffer.from(await response.arrayBuffer()), { bom: true, columns: true }) as Row[];

const logHours = (day: string, hours: number, verify: boolean, taskId: number) =>
	records.logHours(apprentice, supervisor, { day, hours, verify, taskId });

async function signOff(taskId: number, level: 1 | 2 | 3 | 4, day: string) {
	const current = (await framework.current())!;
	return records.signOffRow({
		apprenticeId: apprentice.id,
		supervisorId: supervisor.id,
		taskId,
		frameworkId: current.id,
		level,
		signedAt: new Date(`${day}T10:00:00Z`)
	});
}

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	apprentice = await byRole('apprentice');
	supervisor = await byRole('supervisor');
	coordinator = await byRole('coordinator');
	const profile = await ApprenticeProfile.findByPk(apprentice.id, { rejectOnEmpty: true });
	cohortId = profile.cohortId;
	otherCohortId = (
		await Cohort.findOne({ where: { id: { [Op.ne]: cohortId } }, rejectOnEmpty: true })
	).id;
	const current = (await framework.current())!;
	const [brake, wheel] = await Task.findAll({
		where: { frameworkId: current.id, code: ['BRK-01', 'BRK-02'] },
		order: [['code', 'ASC']]
	});
	await logHours('2026-02-10', 7.5, true, brake.id);
	await logHours('2026-02-11', 6, true, wheel.id);
	await logHours('2026-02-12', 4.5, false, brake.id);
	await rti.record(coordinator, {
		apprenticeId: apprentice.id,
		course: 'Brake systems theory',
		provider: 'Port Alder Technical College',
		completedOn: '2026-01-20',
		hours: 24,
		result: 'passed'
	});
	await signOff(brake.id, 1, '2026-02-12');
	await signOff(brake.id, 3, '2026-02-13');
	const revoked = await signOff(wheel.id, 2, '2026-02-14');
	await assessment.revoke(coordinator, revoked.id, { reason: 'Assessed on the wrong axle.' });
	// A name a spreadsheet would run as a formula, in the same cohort.
	const other = await ApprenticeProfile.findOne({
		where: { userId: { [Op.ne]: apprentice.id } },
		rejectOnEmpty: true
	});
	await User.update({ name: INJECTED }, { where: { id: other.userId } });
	await ApprenticeProfile.update({ cohortId }, { where: { userId: other.userId } });
});

describe('who may export', () => {
	it('refuses apprentices and journeyworkers with 403, signed-out callers with 401', async () => {
		for (const handler of [apprenticeCsvGet, apprenticePdfGet] as Handler[]) {
			expect((await call(handler, apprentice.id, apprentice)).status).toBe(403);
			expect((await call(handler, apprentice.id, supervisor)).status).toBe(403);
			expect((await call(handler, apprentice.id, null)).status).toBe(401);
		}
		for (const handler of [cohortCsvGet, cohortPdfGet] as Handler[]) {
			expect((await call(handler, String(cohortId), apprentice)).status).toBe(403);
		}
	});

	it('answers 404 for unknown and malformed ids, never 500', async () => {
		for (const handler of [apprenticeCsvGet, apprenticePdfGet] as Handler[]) {
			expect((await call(handler, 'nobody-here', coordinator)).status).toBe(404);
			expect((await call(handler, '../etc/passwd', coordinator)).status).toBe(404);
			expect((await call(handler, 'x'.repeat(41), coordinator)).status).toBe(404);
			// A journeyworker is a user but not an apprentice.
			expect((await call(handler, supervisor.id, coordinator)).status).toBe(404);
		}
		for (const handler of [cohortCsvGet, cohortPdfGet] as Handler[]) {
			for (const id of ['999999', '0', '-1', '1.5', '1e3', 'all', 'abc', '99999999999']) {
				expect((await call(handler, id, coordinator)).status, id).toBe(404);
			}
		}
	});
});

describe('apprentice record CSV', () => {
	it('is a UTF-8 attachment whose hours, instruction and wage rows match the engine', async () => {
		const response = await call(apprenticeCsvGet, apprentice.id, coordinator);
		expect(response.status).toBe(200);
		expect(response.headers.get('content-type')).toBe('text/csv; charset=utf-8');
		expect(response.headers.get('content-disposition')).toMatch(
			/^attachment; filename="journeymark-record-rosa-lindqvist-\d{4}-\d{2}-\d{2}\.csv"/
		);
		const data = await rows(response);
		expect(Object.keys(data[0])).toEqual([
			'part',
			'item',
			'label',
			'value',
			'unit',
			'date',
			'journeyworker',
			'status',
			'note'
		]);
		const value = (part: string, item: string) =>
			data.find((r) => r.part === part && r.item === item)?.value;
		const engine = (await progress.apprentice(apprentice.id))!.progress;
		expect(value('record', 'apprentice_name')).toBe('Rosa Lindqvist');
		expect(Number(value('hours', 'verified'))).toBe(engine.hours.verified);
		expect(engine.hours.verified).toBe(13.5);
		expect(Number(value('hours', 'pending'))).toBe(4.5);
		expect(Number(value('hours', 'prior_credit'))).toBe(engine.hours.credit);
		expect(Number(value('hours', 'required'))).toBe(engine.hours.required);
		expect(Number(value('instruction', 'year_1'))).toBe(24);
		expect(Number(value('instruction', 'total'))).toBe(engine.rti.total);
		expect(data.filter((r) => r.part === 'instruction').length).toBe(engine.rti.byYear.length + 1);
		expect(Number(value('wage', 'current'))).toBe(engine.wage.percent);
		expect(Number(value('wage', 'next'))).toBe(engine.wage.next!.percent);
		expect(value('completion', 'status')).toBe('in progress');
		expect(
			data.filter((r) => r.part === 'completion' && r.item.startsWith('missing_'))
		).toHaveLength(engine.completion.missing.length);
	});

	it('lists every sign-off with level, journeyworker and date; shows revocations and superseded levels', async () => {
		const data = (await rows(await call(apprenticeCsvGet, apprentice.id, coordinator))).filter(
			(r) => r.part === 'signoff'
		);
		expect(data.map((r) => [r.item, r.value, r.date, r.journeyworker, r.status])).toEqual([
			['BRK-01', '1', '2026-02-12', 'Dale Okafor', 'superseded'],
			['BRK-01', '3', '2026-02-13', 'Dale Okafor', 'standing'],
			['BRK-02', '2', '2026-02-14', 'Dale Okafor', 'revoked'],
			['BRK-02', '', expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/), 'Priya Castellano', 'revocation']
		]);
		expect(data[3].note).toContain('Assessed on the wrong axle.');
		expect(data[3].note).toMatch(/revocation of sign-off \d+/);
	});
});

describe('cohort record CSV', () => {
	it('has one row per active apprentice whose totals match the engine', async () => {
		const response = await call(cohortCsvGet, String(cohortId), coordinator);
		expect(response.status).toBe(200);
		expect(response.headers.get('content-disposition')).toMatch(
			new RegExp(`^attachment; filename="journeymark-cohort-${cohortId}-autumn-2025-intake-`)
		);
		const data = await rows(response);
		const engine = await progress.cohort(cohortId);
		expect(data).toHaveLength(engine.apprentices.length);
		for (const a of engine.apprentices) {
			const row = data.find((r) => r.apprentice_id === a.id)!;
			expect(Number(row.ojl_verified_h)).toBe(a.verifiedHours);
			expect(Number(row.ojl_pending_h)).toBe(a.pendingHours);
			expect(Number(row.ojl_counted_h)).toBe(a.countedHours);
			expect(Number(row.ojl_required_h)).toBe(a.requiredHours);
			expect(Number(row.rti_total_h)).toBe(a.rtiHours);
			expect(Number(row.tasks_at_required_level)).toBe(a.tasksMet);
			expect(Number(row.wage_current_percent)).toBe(a.wagePercent);
			expect(row.at_risk).toBe(a.atRisk ? 'yes' : 'no');
		}
		const sum = (key: string) => data.reduce((s, r) => s + Number(r[key]), 0);
		expect(Math.round(sum('ojl_verified_h') * 10) / 10).toBe(engine.totals.verifiedHours);
		const rosa = data.find((r) => r.apprentice_id === apprentice.id)!;
		expect(rosa.rti_year_1_h).toBe('24');
		expect(rosa.signoffs_standing).toBe('1');
		expect(rosa.signoffs_revoked).toBe('1');
		expect(rosa.last_signoff_date).toBe('2026-02-14');
	});

	it('neutralises cells a spreadsheet would run as formulas', async () => {
		const data = await rows(await call(cohortCsvGet, String(cohortId), coordinator));
		const names = data.map((r) => r.apprentice_name);
		expect(names).toContain(`'${INJECTED}`);
		expect(names.every((n) => !/^[=+\-@]/.test(n))).toBe(true);
		expect(['=1+1', '+1', '-2', '@SUM(A1)', '\tx'].map(safeCell)).toEqual([
			"'=1+1",
			"'+1",
			"'-2",
			"'@SUM(A1)",
			"'\tx"
		]);
		expect(safeCell(-2)).toBe('-2');
		expect(safeCell('Plain text')).toBe('Plain text');
	});

	it('costs the same number of queries for a large and a small cohort', async () => {
		const count = async (id: number) => {
			let queries = 0;
			// The instance's options are read on every query; the typings leave them out.
			const options = (sequelize as unknown as { options: { logging: unknown } }).options;
			const before = options.logging;
			options.logging = () => {
				queries++;
			};
			try {
				await call(cohortCsvGet, String(id), coordinator);
			} finally {
				options.logging = before;
			}
			return queries;
		};
		const [big, small] = await Promise.all([
			ApprenticeProfile.count({ where: { cohortId } }),
			ApprenticeProfile.count({ where: { cohortId: otherCohortId } })
		]);
		expect(big).not.toBe(small);
		expect(await count(cohortId)).toBe(await count(otherCohortId));
	});
});

describe('PDF records', () => {
	it('gives the apprentice record as a PDF that loads, with the name and agency footer', async () => {
		const response = await call(apprenticePdfGet, apprentice.id, coordinator);
		expect(response.status).toBe(200);
		expect(response.headers.get('content-type')).toBe('application/pdf');
		expect(response.headers.get('content-disposition')).toMatch(
			/filename="journeymark-record-.+\.pdf"/
		);
		const bytes = new Uint8Array(await response.arrayBuffer());
		const doc = await PDFDocument.load(bytes);
		expect(doc.getPageCount()).toBeGreaterThanOrEqual(1);
		expect(doc.getTitle()).toBe('Apprenticeship record: Rosa Lindqvist');
		const text = await pdfText(bytes);
		expect(text).toContain('Rosa Lindqvist');
		expect(text).toContain("registration agency's rules govern");
		expect(text).toContain(`Page 1 of ${doc.getPageCount()}`);
		expect(text).toContain('Assessed on the wrong axle.');
		expect(text).toMatch(/Revoked\s+20\d\d-\d\d-\d\d/);
	});

	it('gives the cohort record with a summary and one section per apprentice', async () => {
		const response = await call(cohortPdfGet, String(cohortId), coordinator);
		expect(response.status).toBe(200);
		const bytes = new Uint8Array(await response.arrayBuffer());
		const doc = await PDFDocument.load(bytes);
		const engine = await progress.cohort(cohortId);
		// The summary page(s), then at least a page for each apprentice.
		expect(doc.getPageCount()).toBeGreaterThan(engine.apprentices.length);
		const text = await pdfText(bytes);
		expect(text).toContain('Autumn 2025 intake');
		expect(text).toContain('Rosa Lindqvist');
		expect(text).toContain(`Page ${doc.getPageCount()} of ${doc.getPageCount()}`);
	});
});

/** All text of a PDF, page after page, through pdf.js. */
async function pdfText(bytes: Uint8Array): Promise<string> {
	const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
	const doc = await pdfjs.getDocument({ data: bytes.slice(), useSystemFonts: false }).promise;
	const pages: string[] = [];
	for (let i = 1; i <= doc.numPages; i++) {
		const content = await (await doc.getPage(i)).getTextContent();
		pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
	}
	return pages.join('\n').replace(/[ \t]+/g, ' ');
}
