import {
	DeleteObjectCommand,
	GetObjectCommand,
	ListObjectsV2Command,
	NoSuchKey,
	PutObjectCommand,
	S3Client
} from '@aws-sdk/client-s3';
import { checkKey, type FileStore } from './types';

interface S3Settings {
	endpoint?: string;
	region: string;
	bucket: string;
	accessKeyId?: string;
	secretAccessKey?: string;
	forcePathStyle: boolean;
}

/** Files in an object store through the S3 API: what a shop on several app servers uses. */
export function s3Store(settings: S3Settings): FileStore {
	const client = new S3Client({
		endpoint: settings.endpoint,
		region: settings.region,
		forcePathStyle: settings.forcePathStyle,
		credentials:
			settings.accessKeyId && settings.secretAccessKey
				? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
				: undefined
	});
	const Bucket = settings.bucket;
	return {
		kind: 's3',
		async put(key, bytes, contentType) {
			checkKey(key);
			await client.send(
				new PutObjectCommand({ Bucket, Key: key, Body: bytes, ContentType: contentType })
			);
		},
		async get(key) {
			checkKey(key);
			try {
				const answer = await client.send(new GetObjectCommand({ Bucket, Key: key }));
				return answer.Body ? await answer.Body.transformToByteArray() : null;
			} catch (e) {
				if (e instanceof NoSuchKey || (e as { name?: string }).name === 'NoSuchKey') return null;
				throw e;
			}
		},
		async delete(key) {
			checkKey(key);
			await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
		},
		async list(prefix) {
			const found: { key: string; modified: Date }[] = [];
			let ContinuationToken: string | undefined;
			do {
				const page = await client.send(
					new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken })
				);
				for (const item of page.Contents ?? [])
					if (item.Key) found.push({ key: item.Key, modified: item.LastModified ?? new Date(0) });
				ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
			} while (ContinuationToken);
			return found;
		}
	};
}
