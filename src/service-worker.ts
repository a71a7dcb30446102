/// <reference types="@sveltejs/kit" />
/// <reference no-default-lib="true"/>
/// <reference lib="esnext" />
/// <reference lib="webworker" />
// Offline in the shop and the classroom: the app's shell, scripts (the engine among them), styles
// and fonts are kept at install, with the public pages that compute in the browser (the lab and
// the shelf check anyone can try). Those pages are fetched without cookies, so what is kept holds
// nobody's data. Everything else goes to the network first; data is never stored here.
import { build, files, version } from '$service-worker';
import { OFFLINE_PAGES } from '$lib/offline/pages';

const sw = self as unknown as ServiceWorkerGlobalScope;
const CACHE = `spanwright-${version}`;
const ASSETS = new Set([...build, ...files]);

sw.addEventListener('install', (event) => {
	event.waitUntil(
		(async () => {
			const cache = await caches.open(CACHE);
			await cache.addAll([...ASSETS]);
			await Promise.all(
				OFFLINE_PAGES.map(async (path) => {
					const res = await fetch(path, { credentials: 'omit' });
					if (res.ok) await cache.put(path, res);
				})
			);
			await sw.skipWaiting();
		})()
	);
});

sw.addEventListener('activate', (event) => {
	event.waitUntil(
		(async () => {
			for (const key of await caches.keys()) if (key !== CACHE) await caches.delete(key);
			await sw.clients.claim();
		})()
	);
});

sw.addEventListener('fetch', (event) => {
	const request = event.request;
	if (request.method !== 'GET') return;
	const url = new URL(request.url);
	if (url.origin !== sw.location.origin) return;

	// the app's own files never change under one version: from the cache
	if (ASSETS.has(url.pathname)) {
		event.respondWith(caches.match(url.pathname).then((hit) => hit ?? fetch(request)));
		return;
	}
	// pages and data: the network first; offline, the kept copy of a public page
	event.respondWith(
		(async () => {
			try {
				return await fetch(request);
			} catch (err) {
				if (request.mode === 'navigate' && OFFLINE_PAGES.includes(url.pathname)) {
					const kept = await caches.match(url.pathname);
					if (kept) return kept;
				}
				const cached = await caches.match(request);
				if (cached) return cached;
				throw err;
			}
		})()
	);
});
