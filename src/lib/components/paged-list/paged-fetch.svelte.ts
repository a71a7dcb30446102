/**
 * One page of a list fetched from the API as the user types, sorts and pages: the request waits
 * for a short pause in typing, a newer request cancels an older one, and loading, failure and retry
 * are kept for the table's loading, error and empty states.
 */
export class PagedFetch<T> {
	result = $state<T | null>(null);
	failure = $state<string | null>(null);
	loading = $state(true);
	attempt = $state(0);

	constructor(private readonly pauseMs = 150) {}

	/**
	 * Call inside an `$effect` that reads the query first (so the effect re-runs when it changes);
	 * returns the effect's cleanup.
	 */
	load(fetchPage: (signal: AbortSignal) => Promise<T>) {
		void this.attempt;
		const controller = new AbortController();
		const timer = setTimeout(async () => {
			this.loading = true;
			this.failure = null;
			try {
				this.result = await fetchPage(controller.signal);
			} catch (e) {
				if (!controller.signal.aborted) this.failure = (e as Error).message;
			} finally {
				if (!controller.signal.aborted) this.loading = false;
			}
		}, this.pauseMs);
		return () => {
			clearTimeout(timer);
			controller.abort();
		};
	}

	retry() {
		this.attempt += 1;
	}
}
