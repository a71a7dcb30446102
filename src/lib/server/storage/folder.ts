import { mkdir, readFile, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import { randomUUID } from 'node:crypto';
import { checkKey, type FileStore } from './types';

/**
 * Files in a folder of the data folder (the embedded default). A put writes a temporary file
 * beside its final name and renames it, so a reader never sees half a file.
 */
export function folderStore(root: string): FileStore {
	const pathOf = (key: string) => {
		checkKey(key);
		return join(root, ...key.split('/'));
	};
	return {
		kind: 'folder',
		async put(key, bytes) {
			const path = pathOf(key);
			await mkdir(dirname(path), { recursive: true });
			const temporary = join(dirname(path), `.part-${randomUUID()}`);
			await writeFile(temporary, bytes);
			await rename(temporary, path);
		},
		async get(key) {
			try {
				return new Uint8Array(await readFile(pathOf(key)));
			} catch (e) {
				if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
				throw e;
			}
		},
		async delete(key) {
			await rm(pathOf(key), { force: true });
		},
		async list(prefix) {
			const base = join(root, ...prefix.split('/').filter(Boolean));
			const found: { key: string; modified: Date }[] = [];
			async function walk(dir: string) {
				let names: string[];
				try {
					names = await readdir(dir);
				} catch {
					return;
				}
				for (const name of names) {
					const path = join(dir, name);
					const info = await stat(path);
					if (info.isDirectory()) await walk(path);
					// a temporary file left by a crash mid-write: never a file anyone asked for
					else if (name.startsWith('.part-')) {
						if (Date.now() - +info.mtime > 60 * 60 * 1000) await rm(path, { force: true });
					} else
						found.push({ key: relative(root, path).split(sep).join('/'), modified: info.mtime });
				}
			}
			await walk(base);
			return found;
		}
	};
}
