/**
 * The shelf screen's advice: what would fix a failing shelf, or how much more a passing one could
 * span or carry. The inverse solvers take tens of milliseconds, so they run once typing pauses and
 * the browser is idle (on a phone the page first finishes loading); the drawing and the answer
 * still follow every keystroke. Advice for an older input is never shown.
 */
import type { ShelfRequest } from '../schemas/shelf';
import { cancelIdle, whenIdle } from './idle';
import type { UserLengthUnit } from './lengths';
import type { ShelfDraft } from './shelf-draft';
import { fixesFor, headroomFor, type ShelfFix } from './shelf-fixes';

const noHeadroom = { maxSpanM: null, maxPressurePa: null };
type Headroom = typeof noHeadroom | ReturnType<typeof headroomFor>;

interface Now {
	draft: ShelfDraft;
	request: ShelfRequest;
	/** the verdict of the current input; null while it cannot be read */
	verdict: boolean | null;
	unit: UserLengthUnit;
}

/** Call while a component starts: `now` reads the screen's current input. */
export function shelfAdvice(now: () => Now) {
	let advice = $state<{ key: string; fixes: ShelfFix[]; headroom: Headroom }>({
		key: '',
		fixes: [],
		headroom: noHeadroom
	});
	const key = $derived(JSON.stringify(now().request));
	$effect(() => {
		const forKey = key;
		const { request, verdict, unit } = now();
		const snapshot = $state.snapshot(now().draft);
		const areaOnly = snapshot.loadKind === 'area';
		let idle = 0;
		const timer = setTimeout(() => {
			idle = whenIdle(() => {
				advice =
					verdict === null
						? { key: forKey, fixes: [], headroom: noHeadroom }
						: verdict
							? { key: forKey, fixes: [], headroom: headroomFor(request, areaOnly) }
							: { key: forKey, fixes: fixesFor(snapshot, request, unit), headroom: noHeadroom };
			});
		}, 120);
		return () => {
			clearTimeout(timer);
			cancelIdle(idle);
		};
	});
	const current = $derived(advice.key === key);
	return {
		get current() {
			return current;
		},
		get fixes() {
			return current ? advice.fixes : [];
		},
		get headroom() {
			return current ? advice.headroom : noHeadroom;
		}
	};
}
