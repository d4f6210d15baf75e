import { randomUUID } from 'node:crypto';
import type { SignedInUser } from '../auth';
import { Evidence, LogEntry, write } from '../db';
import { processUpload } from '../evidence';
import { storageFromConfig } from '../storage';
import { canView } from './access';
import { EntryProblem, notFound } from './errors';

export const MAX_FILES_PER_ENTRY = 10;
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

export const storage = () => storageFromConfig('uploads');

/** Stores a photo or PDF on the apprentice's own entry, re-encoded and stripped of metadata. */
export async function attach(
	user: SignedInUser,
	entryId: number,
	bytes: Uint8Array,
	name: string
): Promise<{ id: number }> {
	const entry = await LogEntry.findByPk(entryId, { attributes: ['id', 'apprenticeId', 'status'] });
	if (!entry || entry.apprenticeId !== user.id) throw notFound();
	if (entry.status === 'verified') {
		throw new EntryProblem(409, {
			file: 'This entry is verified; evidence can no longer be added.'
		});
	}
	if ((await Evidence.count({ where: { entryId } })) >= MAX_FILES_PER_ENTRY) {
		throw new EntryProblem(409, { file: `An entry holds at most ${MAX_FILES_PER_ENTRY} files.` });
	}
	const processed = await processUpload(bytes, name, { maxBytes: MAX_UPLOAD_BYTES });
	if (!processed.ok) throw new EntryProblem(processed.status, { file: processed.message });

	const store = storage();
	const key = `evidence/${randomUUID()}`;
	const thumbnailKey = processed.thumbnail ? `thumbs/${randomUUID()}` : null;
	await store.put(key, processed.bytes, processed.mime);
	if (thumbnailKey && processed.thumbnail)
		await store.put(thumbnailKey, processed.thumbnail, 'image/webp');
	try {
		const row = await write((transaction) =>
			Evidence.create(
				{
					entryId,
					uploadedById: user.id,
					kind: processed.kind,
					mime: processed.mime,
					bytes: processed.bytes.length,
					storageKey: key,
					thumbnailKey,
					originalName: name.replace(/[^\w .()-]/g, '_').slice(0, 120) || 'upload'
				},
				{ transaction }
			)
		);
		return { id: row.id };
	} catch (err) {
		// Nothing half-stored: the bytes go when the row could not be written.
		await store.delete(key);
		if (thumbnailKey) await store.delete(thumbnailKey);
		throw err;
	}
}

/** The bytes of one file (or its thumbnail) for someone allowed to see its entry. */
export async function read(user: SignedInUser, id: number, thumbnail: boolean) {
	const evidence = await Evidence.findByPk(id, {
		include: [{ model: LogEntry, as: 'entry', attributes: ['apprenticeId'] }]
	});
	if (!evidence) return null;
	const entry = (evidence as Evidence & { entry: LogEntry }).entry;
	if (!(await canView(user, entry))) return null;
	const key = thumbnail && evidence.thumbnailKey ? evidence.thumbnailKey : evidence.storageKey;
	const bytes = await storage().get(key);
	if (!bytes) return null;
	return {
		bytes,
		mime: thumbnail && evidence.thumbnailKey ? 'image/webp' : evidence.mime,
		name: evidence.originalName
	};
}
