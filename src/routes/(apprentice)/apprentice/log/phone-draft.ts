/** A copy of the log form kept on the phone, so a reload or a lost signal loses nothing. */
import type { EntryValues } from './entry-values';

const PREFIX = 'journeymark.log-draft.';

export interface PhoneDraft {
	values: EntryValues;
	rows: number;
	savedAt: string;
}

function isDraft(value: unknown): value is PhoneDraft {
	if (!value || typeof value !== 'object') return false;
	const draft = value as PhoneDraft;
	return (
		typeof draft.savedAt === 'string' &&
		Number.isInteger(draft.rows) &&
		draft.rows >= 1 &&
		draft.rows <= 10 &&
		typeof draft.values === 'object' &&
		draft.values !== null &&
		Object.entries(draft.values).every(
			([k, v]) => /^[\w.]{1,40}$/.test(k) && typeof v === 'string' && v.length <= 2100
		)
	);
}

export function loadPhoneDraft(key: string): PhoneDraft | null {
	try {
		const parsed: unknown = JSON.parse(localStorage.getItem(PREFIX + key) ?? 'null');
		return isDraft(parsed) ? parsed : null;
	} catch {
		// Unreadable or blocked storage means there is simply no copy to restore.
		return null;
	}
}

export function savePhoneDraft(key: string, values: EntryValues, rows: number): void {
	try {
		const draft: PhoneDraft = { values, rows, savedAt: new Date().toISOString() };
		localStorage.setItem(PREFIX + key, JSON.stringify(draft));
	} catch {
		// A full or private-mode store: the form still works, only without the copy.
	}
}

export function clearPhoneDraft(key: string): void {
	try {
		localStorage.removeItem(PREFIX + key);
	} catch {
		// Nothing stored, nothing to clear.
	}
}
