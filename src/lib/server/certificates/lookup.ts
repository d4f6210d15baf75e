/**
 * The public lookup behind /verify and /api/verify: one indexed query on the shared read
 * connection, no model hydration, the issuer's public keys cached per process. This is the path
 * an employer's scan takes, so it is kept lean.
 */
import type { Database, Statement } from 'sqlite3';
import { REASON_LABEL, type CertificateStatus, type RevocationReason } from '../../certificates';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { CertificateContent } from './content';
import { publishedKey } from './keys';
import { verifyContent } from './signing';

interface Row {
	serial: string;
	content: string;
	key_id: string;
	signature: string;
	expires_at: string | Date | null;
	revoked_at: string | Date | null;
	revocation_reason: RevocationReason | null;
}

/** Exactly what the certificate itself shows; nothing about the holder beyond their name. */
export interface PublicView {
	serial: string;
	status: CertificateStatus;
	holder: string;
	programme: string;
	title: string;
	kind: 'programme' | 'area';
	issuedAt: string;
	expiresAt: string | null;
	issuer: string;
	scope: { code: string; name: string; tasks: number; verifiedHours: number }[];
	tasks: number;
	hours: CertificateContent['scope']['hours'];
	revoked: { at: string; reason: string } | null;
	signatureValid: boolean;
}

const SQL = `SELECT serial, content, key_id, signature, expires_at, revoked_at, revocation_reason
	FROM certificates WHERE serial = ?`;

type Manager = {
	getConnection(options?: object): Promise<Database>;
	close(): Promise<void>;
};
const manager = sequelize.connectionManager as unknown as Manager;

// One prepared statement per connection: node-sqlite3's one-off get() prepares, runs and
// finalises, three trips to the thread pool where a kept statement needs one.
const statements = new Map<Database, Statement>();
const closeConnections = manager.close.bind(manager);
// SQLite refuses to close a connection with a statement still open.
manager.close = async () => {
	await Promise.all(
		[...statements.values()].map((s) => new Promise<void>((resolve) => s.finalize(() => resolve())))
	);
	statements.clear();
	return closeConnections();
};

async function readRow(serial: string): Promise<Row | undefined> {
	if (sequelize.getDialect() !== 'sqlite') {
		const rows = await sequelize.query<Row>(SQL, {
			type: QueryTypes.SELECT,
			replacements: [serial]
		});
		return rows[0];
	}
	const connection = await manager.getConnection({});
	let statement = statements.get(connection);
	if (!statement) {
		statement = connection.prepare(SQL);
		statements.set(connection, statement);
	}
	const query = statement;
	// all(), not get(): stepping to the end closes the statement's read transaction, so later
	// lookups see later writes (a get() left open would pin this connection to an old snapshot).
	return new Promise((resolve, reject) =>
		query.all([serial], (err: Error | null, rows: Row[]) => (err ? reject(err) : resolve(rows[0])))
	);
}

const VERDICTS_KEPT = 10_000;
// Signature checks by signature: a stored certificate never changes, and an Ed25519 check costs
// more than the rest of the lookup. A hit still needs the same text and key, so a record changed
// in the database is checked afresh (and fails).
const verdicts = new Map<string, { text: string; keyId: string; valid: boolean }>();

function signatureHolds(row: Row, key: Parameters<typeof verifyContent>[0] | undefined) {
	if (!key) return false;
	const known = verdicts.get(row.signature);
	if (known && known.text === row.content && known.keyId === row.key_id) return known.valid;
	const valid = verifyContent(key, row.content, row.signature);
	if (verdicts.size >= VERDICTS_KEPT) verdicts.clear();
	verdicts.set(row.signature, { text: row.content, keyId: row.key_id, valid });
	return valid;
}

// SQLite gives the stored text, PostgreSQL a Date.
const iso = (stored: string | Date) => new Date(stored).toISOString();

/** The public view of a certificate, or null for a serial that was never issued. */
export async function lookup(serial: string, now = new Date()): Promise<PublicView | null> {
	const row = await readRow(serial);
	if (!row) return null;
	const signatureValid = signatureHolds(row, await publishedKey(row.key_id));
	const content = JSON.parse(row.content) as CertificateContent;
	// The stored columns decide revocation and expiry; the signed content decides everything shown.
	const expiresAt = content.expiresAt;
	const status: CertificateStatus = row.revoked_at
		? 'revoked'
		: expiresAt && new Date(expiresAt).getTime() <= now.getTime()
			? 'expired'
			: 'valid';
	return {
		serial: content.serial,
		status,
		holder: content.holder,
		programme: content.programme.name,
		title: content.scope.title,
		kind: content.scope.kind,
		issuedAt: content.issuedAt,
		expiresAt,
		issuer: content.issuer.name,
		scope: content.scope.areas,
		tasks: content.scope.tasks.length,
		hours: content.scope.hours,
		revoked: row.revoked_at
			? {
					at: iso(row.revoked_at),
					reason: row.revocation_reason ? REASON_LABEL[row.revocation_reason] : 'Withdrawn'
				}
			: null,
		signatureValid: signatureValid && content.serial === row.serial
	};
}
