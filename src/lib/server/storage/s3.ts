import {
	DeleteObjectCommand,
	GetObjectCommand,
	HeadBucketCommand,
	PutObjectCommand,
	S3Client,
	S3ServiceException
} from '@aws-sdk/client-s3';
import { assertKey, type Storage } from './local';

export interface S3Options {
	bucket: string;
	/** Empty for AWS itself; the address of an S3-compatible service otherwise. */
	endpoint?: string;
	region?: string;
	accessKeyId?: string;
	secretAccessKey?: string;
	forcePathStyle?: boolean;
}

export interface S3StorageOptions extends S3Options {
	/** Put before every key, e.g. `certificates` stores `x` as `certificates/x`. */
	prefix?: string;
	/** Reuse one client for several prefixes; made from the options otherwise. */
	client?: S3Client;
}

/** How long the start-up check waits for the bucket to answer. */
export const CHECK_TIMEOUT_MS = 5_000;

/** A client for the options; the caller keeps it for the life of the process. */
export function s3Client(
	options: S3Options,
	extra: { maxAttempts?: number; requestTimeout?: number } = {}
): S3Client {
	if (!!options.accessKeyId !== !!options.secretAccessKey) {
		throw new Error('S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY must be set together.');
	}
	// The SDK's version is pinned in package.json and supports Node 20; its notice that later
	// versions will not would otherwise repeat at every start.
	process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
	return new S3Client({
		region: options.region || 'us-east-1',
		endpoint: options.endpoint || undefined,
		forcePathStyle: options.forcePathStyle ?? false,
		// Without keys the SDK's own chain applies (environment, profile, instance role).
		credentials:
			options.accessKeyId && options.secretAccessKey
				? { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey }
				: undefined,
		// S3-compatible services often refuse the SDK's default checksum trailers; AWS needs none here.
		...(options.endpoint
			? { requestChecksumCalculation: 'WHEN_REQUIRED', responseChecksumValidation: 'WHEN_REQUIRED' }
			: {}),
		maxAttempts: extra.maxAttempts ?? 3,
		requestHandler: {
			connectionTimeout: CHECK_TIMEOUT_MS,
			requestTimeout: extra.requestTimeout ?? 60_000,
			throwOnRequestTimeout: true
		}
	});
}

function status(error: unknown): number | undefined {
	return (error as S3ServiceException)?.$metadata?.httpStatusCode;
}

function isMissingKey(error: unknown): boolean {
	const name = (error as Error)?.name;
	// A missing bucket is also a 404, but that is a fault, not an absent object.
	return name === 'NoSuchKey' || (status(error) === 404 && name !== 'NoSuchBucket');
}

/** Objects in an S3 bucket; the same keys as `localDisk`, optionally below a prefix. */
export function s3Storage(options: S3StorageOptions): Storage {
	if (options.prefix !== undefined) assertKey(options.prefix);
	const client = options.client ?? s3Client(options);
	const Bucket = options.bucket;

	function keyOf(key: string): string {
		assertKey(key);
		return options.prefix ? `${options.prefix}/${key}` : key;
	}

	return {
		async put(key, bytes, contentType) {
			const Key = keyOf(key);
			await client.send(
				new PutObjectCommand({ Bucket, Key, Body: bytes, ContentType: contentType })
			);
		},

		async get(key) {
			const Key = keyOf(key);
			try {
				const object = await client.send(new GetObjectCommand({ Bucket, Key }));
				if (!object.Body) return null;
				const bytes = await object.Body.transformToByteArray();
				return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
			} catch (error) {
				if (isMissingKey(error)) return null;
				throw error;
			}
		},

		async delete(key) {
			const Key = keyOf(key);
			// S3 answers 204 for a key that is already gone, so deleting twice is not an error.
			try {
				await client.send(new DeleteObjectCommand({ Bucket, Key }));
			} catch (error) {
				if (!isMissingKey(error)) throw error;
			}
		}
	};
}

/**
 * Asks whether the bucket exists and answers, with one HeadBucket request and no retries.
 * Never creates the bucket or writes anything. Throws an Error with a message for people.
 */
export async function checkBucket(options: S3Options, timeoutMs = CHECK_TIMEOUT_MS): Promise<void> {
	const where = options.endpoint || `AWS S3 (${options.region || 'us-east-1'})`;
	const prefix = `Storage bucket "${options.bucket}" at ${where}`;
	const client = s3Client(options, { maxAttempts: 1, requestTimeout: timeoutMs });
	try {
		await client.send(new HeadBucketCommand({ Bucket: options.bucket }), {
			abortSignal: AbortSignal.timeout(timeoutMs)
		});
	} catch (error) {
		const name = (error as Error)?.name;
		const code = status(error);
		if (code === 404 || name === 'NotFound' || name === 'NoSuchBucket') {
			throw new Error(`${prefix} does not exist. Create it first or correct S3_BUCKET.`, {
				cause: error
			});
		}
		if (code === 403 || name === 'Forbidden' || name === 'AccessDenied') {
			throw new Error(
				`${prefix}: access denied. Check S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY and the bucket's policy.`,
				{ cause: error }
			);
		}
		if (code === 301 || name === 'PermanentRedirect') {
			throw new Error(`${prefix} is in another region than S3_REGION "${options.region}".`, {
				cause: error
			});
		}
		if (name === 'CredentialsProviderError') {
			throw new Error(
				`${prefix} could not be reached: no credentials found. Set S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY.`,
				{ cause: error }
			);
		}
		const reason =
			name === 'AbortError' || name === 'TimeoutError'
				? `no answer within ${timeoutMs / 1000} s`
				: describe(error);
		throw new Error(`${prefix} could not be reached: ${reason}.`, { cause: error });
	} finally {
		client.destroy();
	}
}

function describe(error: unknown): string {
	const e = error as Error & { code?: string };
	const text = (e?.message || e?.name || String(error)).replace(/\.$/, '');
	// Node's connection errors name their cause in `code` (ECONNREFUSED, ENOTFOUND).
	const parts = [e?.code && !text.includes(e.code) ? e.code : '', text];
	const code = status(error);
	if (code) parts.push(`(HTTP ${code})`);
	return parts.filter(Boolean).join(' ');
}
