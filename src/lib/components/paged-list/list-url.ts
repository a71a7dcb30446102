/**
 * A list's state lives in its page's URL (search, filters, sort, page), so a list can be
 * bookmarked, shared, and used without JavaScript. These build the links that change one part.
 */
import type { ResolvedPathname } from '$app/types';

export type ListParams = Record<string, string | number | null | undefined>;

/** The page's own address with some parameters set (or removed, for '', null or undefined). */
export function listHref(url: URL, changes: ListParams): ResolvedPathname {
	const params = new URLSearchParams();
	// a form action's name (`?/delete`) is not part of the list's state
	for (const [k, v] of url.searchParams) if (!k.startsWith('/')) params.append(k, v);
	for (const [k, v] of Object.entries(changes)) {
		if (v === null || v === undefined || v === '') params.delete(k);
		else params.set(k, String(v));
	}
	const query = params.toString();
	// the page's own pathname, already resolved against the base path
	return (query ? `${url.pathname}?${query}` : url.pathname) as ResolvedPathname;
}

/**
 * The link of a sortable column heading: the same column again flips the order; another column
 * starts in its natural order (newest first for dates, A to Z for words) on page 1.
 */
export function sortHref(
	url: URL,
	column: string,
	current: { sort: string; dir: 'asc' | 'desc' },
	newestFirst: readonly string[] = ['updated', 'created']
): ResolvedPathname {
	const dir =
		current.sort === column
			? current.dir === 'asc'
				? 'desc'
				: 'asc'
			: newestFirst.includes(column)
				? 'desc'
				: 'asc';
	return listHref(url, { sort: column, dir, page: null });
}

/** A form action's address that keeps the list where it is (`?/duplicate&q=…&page=2`). */
export function actionHref(url: URL, action: string, changes: ListParams = {}): string {
	const kept = listHref(url, changes).slice(url.pathname.length + 1);
	return kept ? `?/${action}&${kept}` : `?/${action}`;
}

/** Call `run` once typing pauses for `ms`; a new call within the pause starts the wait again. */
export function debounce<A extends unknown[]>(run: (...args: A) => void, ms: number) {
	let timer: ReturnType<typeof setTimeout> | undefined;
	const call = (...args: A) => {
		clearTimeout(timer);
		timer = setTimeout(() => run(...args), ms);
	};
	call.cancel = () => clearTimeout(timer);
	return call;
}
