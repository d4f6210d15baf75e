import { Op, type Transaction } from 'sequelize';
import { canonicalJson, GENESIS, linkHash, verifyChain } from './assessment/chain';
import { AuditEvent } from './db';

export type AuditKind =
	| 'hours.verified'
	| 'hours.returned'
	| 'sign-off.made'
	| 'sign-off.corrected'
	| 'sign-off.revoked'
	| 'certificate.issued'
	| 'certificate.revoked'
	| 'credit.set';

/**
 * Appends one event to the hash chain. Call it inside the write transaction that makes the
 * change, so the event and the change land together and the queue keeps the chain in order.
 */
export async function append(
	transaction: Transaction,
	event: {
		kind: AuditKind;
		subject: string;
		actorId: string | null;
		content: Record<string, unknown>;
	}
): Promise<AuditEvent> {
	const last = await AuditEvent.findOne({
		order: [['id', 'DESC']],
		attributes: ['hash'],
		transaction
	});
	const previousHash = last?.hash ?? GENESIS;
	const at = new Date();
	const content = {
		...event.content,
		kind: event.kind,
		subject: event.subject,
		actorId: event.actorId,
		at: at.toISOString()
	};
	return AuditEvent.create(
		{
			at,
			actorId: event.actorId,
			kind: event.kind,
			subject: event.subject,
			content: canonicalJson(content),
			previousHash,
			hash: linkHash(previousHash, content)
		},
		{ transaction }
	);
}

const BATCH = 2000;

/** Walks the whole chain in id order and reports the first broken link. */
export async function verify(): Promise<
	{ ok: true; count: number } | { ok: false; brokenAt: number; reason: string }
> {
	let count = 0;
	let previous: { id: number; previousHash: string; hash: string; content: object } | null = null;
	for (let afterId = 0; ;) {
		const rows = await AuditEvent.findAll({
			where: { id: { [Op.gt]: afterId } },
			order: [['id', 'ASC']],
			limit: BATCH,
			raw: true
		});
		if (rows.length === 0) break;
		const chunk = rows.map((r) => {
			let content: object;
			try {
				content = JSON.parse(r.content) as object;
			} catch {
				content = { unreadable: r.content };
			}
			return { id: r.id, previousHash: r.previousHash, hash: r.hash, content };
		});
		// Carry the last row of the previous batch so the link across batches is checked too.
		const result = verifyChain(chunk, previous ?? undefined);
		if (!result.ok) return result;
		count += chunk.length;
		previous = chunk[chunk.length - 1];
		afterId = previous.id;
	}
	return { ok: true, count };
}
