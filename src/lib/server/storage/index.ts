import { constants } from 'node:fs';
import { access, mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { S3Client } from '@aws-sdk/client-s3';
import { config } from '../config';
import { localDisk, type Storage } from './local';
import { checkBucket, s3Client, s3Storage, type S3Options } from './s3';

export { assertKey, localDisk, type Storage } from './local';
export {
	checkBucket,
	s3Client,
	s3Storage,
	CHECK_TIMEOUT_MS,
	type S3Options,
	type S3StorageOptions
} from './s3';

/** What is stored: uploaded evidence and photos, or the rendered certificate PDFs (a cache). */
export type StorageArea = 'uploads' | 'certificates';

function s3Options(): S3Options {
	return {
		bucket: config.S3_BUCKET!,
		endpoint: config.S3_ENDPOINT,
		region: config.S3_REGION,
		accessKeyId: config.S3_ACCESS_KEY_ID,
		secretAccessKey: config.S3_SECRET_ACCESS_KEY,
		forcePathStyle: config.S3_FORCE_PATH_STYLE === 'true'
	};
}

let client: S3Client | undefined;
const shared = new Map<StorageArea, Storage>();

/**
 * The storage the settings choose (`STORAGE`), one per area for the process. In a bucket, uploads
 * keep the same keys as on disk and certificate PDFs sit below `certificates/`.
 */
export function storageFromConfig(area: StorageArea = 'uploads'): Storage {
	let storage = shared.get(area);
	if (!storage) {
		if (config.STORAGE === 's3') {
			const options = s3Options();
			client ??= s3Client(options);
			storage = s3Storage({
				...options,
				client,
				prefix: area === 'certificates' ? 'certificates' : undefined
			});
		} else {
			storage = localDisk(area === 'certificates' ? config.CERTIFICATES_DIR : config.UPLOADS_DIR);
		}
		shared.set(area, storage);
	}
	return storage;
}

/**
 * Refuses to go on when the configured storage cannot be used: for a bucket, one HeadBucket with a
 * short timeout (nothing created, nothing written); on disk, the folders must be writable.
 */
export async function checkStorage(): Promise<void> {
	if (config.STORAGE === 's3') {
		await checkBucket(s3Options());
		return;
	}
	for (const dir of [config.UPLOADS_DIR, config.CERTIFICATES_DIR]) {
		const full = path.resolve(dir);
		try {
			await mkdir(full, { recursive: true });
			await access(full, constants.W_OK);
		} catch (error) {
			throw new Error(`Storage folder "${full}" cannot be written: ${(error as Error).message}`, {
				cause: error
			});
		}
	}
}
