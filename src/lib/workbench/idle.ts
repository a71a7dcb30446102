/**
 * Run work when the browser is idle (at the latest after `timeoutMs`), so slow advice never holds up
 * a page that is still loading or a key being typed; where there is no idle callback, at once.
 * Returns a handle for cancelIdle (0: nothing to cancel).
 */
export function whenIdle(work: () => void, timeoutMs = 1000): number {
	if (typeof requestIdleCallback !== 'function') {
		work();
		return 0;
	}
	return requestIdleCallback(work, { timeout: timeoutMs });
}

export function cancelIdle(handle: number) {
	if (handle && typeof cancelIdleCallback === 'function') cancelIdleCallback(handle);
}
