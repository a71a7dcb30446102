import { join } from 'node:path';
import { dataDir } from '../db';
import { folderStore } from './folder';
import { s3Store } from './s3';
import type { FileStore } from './types';

export type { FileStore } from './types';

/**
 * The configured store: an S3-compatible bucket when S3_BUCKET is set (S3_ENDPOINT, S3_REGION,
 * S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY), otherwise the uploads folder of the data folder.
 */
function storeFromEnvironment(env: NodeJS.ProcessEnv = process.env): FileStore {
	if (env.S3_BUCKET)
		return s3Store({
			bucket: env.S3_BUCKET,
			endpoint: env.S3_ENDPOINT || undefined,
			region: env.S3_REGION || 'us-east-1',
			accessKeyId: env.S3_ACCESS_KEY_ID || undefined,
			secretAccessKey: env.S3_SECRET_ACCESS_KEY || undefined,
			// a self-hosted store (an endpoint of its own) usually wants path-style addresses
			forcePathStyle: env.S3_FORCE_PATH_STYLE
				? env.S3_FORCE_PATH_STYLE === 'true'
				: Boolean(env.S3_ENDPOINT)
		});
	return folderStore(join(dataDir, 'uploads'));
}

let store: FileStore | undefined;

/** The app's file store, made once. */
export function getStore(): FileStore {
	store ??= storeFromEnvironment();
	return store;
}

/** For tests: swap in a store and get back the one it replaced. */
export function useStore(next: FileStore | undefined) {
	const previous = store;
	store = next;
	return previous;
}
