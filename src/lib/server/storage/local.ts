import { randomUUID } from 'node:crypto';
import { mkdir, open, readFile, rename, rm } from 'node:fs/promises';
import path from 'node:path';

/** Where uploaded bytes live. Keys are made by the caller from random ids, never from user input. */
export interface Storage {
	put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
	get(key: string): Promise<Buffer | null>;
	delete(key: string): Promise<void>;
}

// Lower-case letters, digits and hyphens in '/'-separated segments: no dots, so no '..'.
const KEY_PATTERN = /^[a-z0-9-]+(\/[a-z0-9-]+)*$/;
const MAX_KEY_LENGTH = 200;

/** Throws unless the key is safe to use as a path below the root. */
export function assertKey(key: string): void {
	if (typeof key !== 'string' || key.length > MAX_KEY_LENGTH || !KEY_PATTERN.test(key)) {
		throw new Error(`Refused storage key ${JSON.stringify(String(key).slice(0, 80))}.`);
	}
}

function isMissing(error: unknown): boolean {
	return (error as NodeJS.ErrnoException)?.code === 'ENOENT';
}

/** Files under `root` (the app passes `config.UPLOADS_DIR`, outside the web root). */
export function localDisk(root: string): Storage {
	const base = path.resolve(root);

	function pathOf(key: string): string {
		assertKey(key);
		const file = path.resolve(base, key);
		// The pattern already rules out traversal; this second check costs nothing.
		if (!file.startsWith(base + path.sep)) throw new Error('Refused storage key outside the root.');
		return file;
	}

	return {
		// Local files need no content type: the evidence record keeps it for serving.
		async put(key, bytes) {
			const file = pathOf(key);
			await mkdir(path.dirname(file), { recursive: true });
			// A temp name with a dot can never collide with a key; rename makes the write all-or-nothing.
			const temp = `${file}.${randomUUID()}.tmp`;
			const handle = await open(temp, 'wx', 0o600);
			try {
				await handle.writeFile(bytes);
				await handle.sync();
			} catch (error) {
				await handle.close();
				await rm(temp, { force: true });
				throw error;
			}
			await handle.close();
			try {
				await rename(temp, file);
			} catch (error) {
				await rm(temp, { force: true });
				throw error;
			}
		},

		async get(key) {
			try {
				return await readFile(pathOf(key));
			} catch (error) {
				if (isMissing(error)) return null;
				throw error;
			}
		},

		async delete(key) {
			// Deleting what is already gone is not an error: retries and clean-ups stay simple.
			await rm(pathOf(key), { force: true });
		}
	};
}
