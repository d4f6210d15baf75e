/**
 * Certificates: issued by a coordinator when the progress engine says the apprentice qualifies,
 * signed with the issuer's Ed25519 key, e-mailed as PDF, verifiable by anyone, revocable with
 * a reason. Routes call these functions and stay thin.
 */
import { createHash, randomBytes, randomInt } from 'node:crypto';
import { mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { Op } from 'sequelize';
import {
	issueSchema,
	REASON_LABEL,
	revokeSchema,
	serialFromBytes,
	STATUS_WORD,
	type CertificateStatus
} from '../../certificates';
import * as audit from '../audit';
import type { SignedInUser } from '../auth';
import { config } from '../config';
import { Certificate, User, write } from '../db';
import * as mail from '../mail';
import { qualification } from '../progress';
import { storageFromConfig } from '../storage';
import { EntryProblem } from '../worklog/errors';
import { buildContent, missingFor, type CertificateContent, type Scope } from './content';
import {
	credentialJwt,
	openBadgeCredential,
	STATUS_LIST_ID,
	STATUS_LIST_SIZE,
	statusListCredential,
	statusListJwt
} from './credential';
import { ring } from './keys';
import { render, type Paper } from './pdf';
import { signContent } from './signing';

export { jwks, rotate } from './keys';
export { lookup, type PublicView } from './lookup';

const problem = (status: 400 | 403 | 404 | 409, form: string, extra: Record<string, string> = {}) =>
	new EntryProblem(status, { form, ...extra });

function zodErrors(issues: { path: PropertyKey[]; message: string }[]) {
	const errors: Record<string, string> = {};
	for (const issue of issues) errors[issue.path.join('.') || 'form'] ??= issue.message;
	return errors;
}

export const verifyUrl = (serial: string) => new URL(`/verify/${serial}`, config.ORIGIN).href;

export function statusOf(
	row: Pick<Certificate, 'revokedAt' | 'expiresAt'>,
	now = new Date()
): CertificateStatus {
	if (row.revokedAt) return 'revoked';
	if (row.expiresAt && row.expiresAt.getTime() <= now.getTime()) return 'expired';
	return 'valid';
}

const parseScope = (text: string): Scope =>
	text === 'programme' ? { kind: 'programme' } : { kind: 'area', code: text.slice(5) };

/** Options for seeding and tests: a fixed clock and a source of serial bytes. */
export interface IssueOptions {
	now?: Date;
	serialBytes?: () => Uint8Array;
	/** Send the holder the PDF (default true). */
	notify?: boolean;
}

/**
 * Issues a certificate, or refuses with what is missing. Nothing is stored when refused; the
 * e-mail goes after the certificate is committed, and a mail failure does not undo the issue.
 */
export async function issue(actor: SignedInUser, input: unknown, options: IssueOptions = {}) {
	if (actor.role !== 'coordinator') throw problem(403, 'Only coordinators issue certificates.');
	const parsed = issueSchema.safeParse(input);
	if (!parsed.success) throw new EntryProblem(400, zodErrors(parsed.error.issues));
	const { apprenticeId } = parsed.data;
	const scope = parseScope(parsed.data.scope);
	const apprentice = await User.findOne({ where: { id: apprenticeId, role: 'apprentice' } });
	if (!apprentice) throw problem(404, 'No such apprentice.');
	const standing = await qualification(apprenticeId);
	if (!standing) throw problem(409, `${apprentice.name} is not enrolled in a programme.`);
	const missing = missingFor(standing, scope);
	if (missing.length) {
		throw problem(409, `${apprentice.name} does not qualify for this certificate yet.`, {
			missing: missing.join('\n')
		});
	}
	const keys = await ring();
	const now = options.now ?? new Date();
	const scopeCode = scope.kind === 'area' ? scope.code : '';

	const certificate = await write(async (transaction) => {
		const held = await Certificate.findAll({
			where: { apprenticeId, scopeKind: scope.kind, scopeCode, revokedAt: null },
			transaction
		});
		const live = held.find((c) => statusOf(c, now) === 'valid');
		if (live) {
			throw problem(
				409,
				`${apprentice.name} already holds a valid certificate for this (${live.serial}). Withdraw it first if it must be replaced.`
			);
		}
		// A serial is never used twice, revoked ones included: draw again on the rare clash.
		let serial = '';
		for (let attempt = 0; attempt < 5 && !serial; attempt++) {
			const candidate = serialFromBytes(options.serialBytes?.() ?? randomBytes(10));
			if (!(await Certificate.count({ where: { serial: candidate }, transaction })))
				serial = candidate;
		}
		if (!serial) throw new Error('Could not draw an unused serial.');
		let statusIndex = -1;
		for (let attempt = 0; attempt < 20 && statusIndex < 0; attempt++) {
			// Random positions, so a list entry says nothing about when a certificate was issued.
			const candidate = randomInt(STATUS_LIST_SIZE);
			if (!(await Certificate.count({ where: { statusIndex: candidate }, transaction })))
				statusIndex = candidate;
		}
		if (statusIndex < 0) throw new Error('The status list is full.');

		const content = buildContent(standing, scope, {
			serial,
			issuedAt: now,
			issuer: {
				name: config.ISSUER_NAME,
				url: new URL('/', config.ORIGIN).href,
				signedBy: actor.name
			},
			keyId: keys.ed25519.kid
		});
		const { text, signature } = signContent(keys.ed25519.privateKey, content);
		const row = await Certificate.create(
			{
				serial,
				apprenticeId,
				programmeId: standing.programme.id,
				scopeKind: scope.kind,
				scopeCode,
				holder: content.holder,
				title: content.scope.title,
				content: text,
				keyId: keys.ed25519.kid,
				signature,
				statusIndex,
				issuedAt: now,
				expiresAt: content.expiresAt ? new Date(content.expiresAt) : null,
				issuedById: actor.id,
				revokedAt: null,
				revokedById: null,
				revocationReason: null,
				revocationNote: null
			},
			{ transaction }
		);
		await audit.append(transaction, {
			kind: 'certificate.issued',
			subject: `certificate:${serial}`,
			actorId: actor.id,
			content: {
				serial,
				apprenticeId,
				scope: parsed.data.scope,
				signature,
				keyId: keys.ed25519.kid
			}
		});
		return row;
	});

	let mailed = false;
	if (options.notify !== false) {
		try {
			await notifyHolder(certificate, apprentice.email);
			mailed = true;
		} catch (err) {
			console.error(`Certificate ${certificate.serial} issued but not e-mailed:`, err);
		}
	}
	return { serial: certificate.serial, mailed };
}

async function notifyHolder(certificate: Certificate, email: string) {
	const content = JSON.parse(certificate.content) as CertificateContent;
	const pdf = await pdfFor(certificate, 'letter');
	await mail.send({
		to: email,
		subject: `Your certificate: ${content.scope.title}`,
		text: [
			`Hello ${content.holder},`,
			'',
			`${config.ISSUER_NAME} has issued you a certificate: ${content.scope.title}.`,
			`Serial: ${certificate.serial}`,
			'',
			'The PDF (US Letter) is attached. An A4 copy and a portable digital credential are on your certificates page:',
			mail.link('/apprentice/certificates'),
			'',
			'Anyone can check it, without an account, by scanning the QR code or opening:',
			verifyUrl(certificate.serial)
		].join('\n'),
		attachments: [
			{
				filename: `${certificate.serial}.pdf`,
				content: Buffer.from(pdf),
				contentType: 'application/pdf'
			}
		]
	});
}

/** Withdraws a certificate with a reason category; the serial is never issued again. */
export async function revoke(
	actor: SignedInUser,
	serial: string,
	input: unknown,
	now = new Date()
) {
	if (actor.role !== 'coordinator') throw problem(403, 'Only coordinators withdraw certificates.');
	const parsed = revokeSchema.safeParse(input);
	if (!parsed.success) throw new EntryProblem(400, zodErrors(parsed.error.issues));
	return write(async (transaction) => {
		const row = await Certificate.findOne({ where: { serial }, transaction });
		if (!row) throw problem(404, 'No certificate has that serial.');
		if (row.revokedAt) {
			throw problem(
				409,
				`This certificate was already withdrawn on ${row.revokedAt.toISOString().slice(0, 10)}.`
			);
		}
		await row.update(
			{
				revokedAt: now,
				revokedById: actor.id,
				revocationReason: parsed.data.reason,
				revocationNote: parsed.data.note || null
			},
			{ transaction }
		);
		await audit.append(transaction, {
			kind: 'certificate.revoked',
			subject: `certificate:${serial}`,
			actorId: actor.id,
			content: { serial, reason: parsed.data.reason, note: parsed.data.note }
		});
		return { serial, revokedAt: now.toISOString(), reason: parsed.data.reason };
	});
}

/** Who may download a certificate's PDF or credential: its holder, coordinators, admins. */
export function mayDownload(user: SignedInUser, certificate: Pick<Certificate, 'apprenticeId'>) {
	return (
		user.role === 'coordinator' || user.role === 'admin' || user.id === certificate.apprenticeId
	);
}

export async function bySerial(serial: string) {
	return Certificate.findOne({ where: { serial } });
}

/** Renders once per serial and paper size; the file is a cache and may be deleted any time. */
export async function pdfFor(certificate: Certificate, paper: Paper): Promise<Uint8Array> {
	// The signature in the name: a rebuilt database reusing a serial never gets an old file.
	const version = createHash('sha256').update(certificate.signature).digest('hex').slice(0, 16);
	const draw = () =>
		render(
			JSON.parse(certificate.content) as CertificateContent,
			verifyUrl(certificate.serial),
			paper
		);
	if (config.STORAGE === 's3') {
		// Storage keys are lower-case; a serial holds only letters, digits and hyphens.
		const key = `${certificate.serial}-${paper}-${version}`.toLowerCase();
		const store = storageFromConfig('certificates');
		const cached = await store.get(key);
		if (cached) return cached;
		const bytes = await draw();
		await store.put(key, bytes, 'application/pdf');
		return bytes;
	}
	const file = path.resolve(
		config.CERTIFICATES_DIR,
		`${certificate.serial}-${paper}-${version}.pdf`
	);
	try {
		return await readFile(file);
	} catch {
		// not rendered yet
	}
	const bytes = await draw();
	await mkdir(path.dirname(file), { recursive: true });
	const temporary = `${file}.${process.pid}.${randomInt(1e9)}.part`;
	await writeFile(temporary, bytes);
	await rename(temporary, file);
	return bytes;
}

/** The Open Badges 3.0 credential as a VC-JWT, signed with the current RSA key. */
export async function credentialFor(certificate: Certificate): Promise<string> {
	const holder = await User.findByPk(certificate.apprenticeId, {
		attributes: ['email'],
		rejectOnEmpty: true
	});
	const keys = await ring();
	const content = JSON.parse(certificate.content) as CertificateContent;
	const credential = openBadgeCredential(content, {
		origin: config.ORIGIN,
		email: holder.email,
		statusIndex: certificate.statusIndex
	});
	return credentialJwt(credential, keys.rsa);
}

/** The revocation list as a signed VC-JWT; every revoked certificate's bit is set. */
export async function statusList(id: number, now = new Date()): Promise<string | null> {
	if (id !== STATUS_LIST_ID) return null;
	const revoked = await Certificate.findAll({
		where: { revokedAt: { [Op.ne]: null } },
		attributes: ['statusIndex'],
		raw: true
	});
	const keys = await ring();
	const list = statusListCredential(
		config.ORIGIN,
		config.ISSUER_NAME,
		revoked.map((r) => r.statusIndex),
		now
	);
	return statusListJwt(list, keys.rsa);
}

export interface CertificateRow {
	serial: string;
	title: string;
	holder: string;
	apprenticeId: string;
	issuedAt: string;
	expiresAt: string | null;
	status: CertificateStatus;
	statusWord: string;
	revokedAt: string | null;
	reason: string | null;
}

function toRow(c: Certificate, now = new Date()): CertificateRow {
	const status = statusOf(c, now);
	return {
		serial: c.serial,
		title: c.title,
		holder: c.holder,
		apprenticeId: c.apprenticeId,
		issuedAt: c.issuedAt.toISOString(),
		expiresAt: c.expiresAt?.toISOString() ?? null,
		status,
		statusWord: STATUS_WORD[status],
		revokedAt: c.revokedAt?.toISOString() ?? null,
		reason: c.revocationReason ? REASON_LABEL[c.revocationReason] : null
	};
}

export async function listForHolder(apprenticeId: string): Promise<CertificateRow[]> {
	const rows = await Certificate.findAll({
		where: { apprenticeId },
		order: [['issuedAt', 'DESC']],
		attributes: { exclude: ['content'] }
	});
	return rows.map((r) => toRow(r));
}

export async function listAll(limit = 500): Promise<CertificateRow[]> {
	const rows = await Certificate.findAll({
		order: [['issuedAt', 'DESC']],
		limit,
		attributes: { exclude: ['content'] }
	});
	return rows.map((r) => toRow(r));
}

/** A coordinator's view of one certificate, with the private note. */
export async function detail(serial: string) {
	const row = await Certificate.findOne({
		where: { serial },
		include: [
			{ model: User, as: 'issuedBy', attributes: ['name'] },
			{ model: User, as: 'revokedBy', attributes: ['name'] }
		]
	});
	if (!row) return null;
	const content = JSON.parse(row.content) as CertificateContent;
	const names = row as unknown as {
		issuedBy?: { name: string };
		revokedBy?: { name: string } | null;
	};
	return {
		...toRow(row),
		programme: content.programme.name,
		areas: content.scope.areas,
		tasks: content.scope.tasks.length,
		hours: content.scope.hours,
		issuedBy: names.issuedBy?.name ?? '',
		revokedBy: names.revokedBy?.name ?? null,
		note: row.revocationNote
	};
}

/** What the coordinator may issue for one apprentice, with what is missing for the rest. */
export async function options(apprenticeId: string) {
	const standing = await qualification(apprenticeId);
	if (!standing) return null;
	const held = await Certificate.findAll({
		where: { apprenticeId, revokedAt: null },
		attributes: ['serial', 'scopeKind', 'scopeCode', 'revokedAt', 'expiresAt']
	});
	const holding = (kind: string, code: string) =>
		held.find((c) => c.scopeKind === kind && c.scopeCode === code && statusOf(c) === 'valid')
			?.serial ?? null;
	const programme = {
		value: 'programme',
		label: `Programme completion: ${standing.programme.name}`,
		missing: missingFor(standing, { kind: 'programme' }),
		held: holding('programme', '')
	};
	const areas = standing.areas.map((a) => ({
		value: `area:${a.code}`,
		label: `Interim credential: ${a.name} (${a.code})`,
		missing: missingFor(standing, { kind: 'area', code: a.code }),
		held: holding('area', a.code)
	}));
	return {
		holder: standing.holder,
		programme: standing.programme.name,
		interimAllowed: standing.interimAllowed,
		choices: [programme, ...areas]
	};
}
