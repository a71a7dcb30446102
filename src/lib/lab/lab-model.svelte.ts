/**
 * The lab screen's state: the shelf, the ghost of the shelf before the last movement, the stated
 * exaggeration (which a teacher can lock), the chosen variable, the running experiment. The shelf
 * and the chart's dot follow every movement; the laws wait for a pause (they run the engine a dozen
 * times) and the chart's curve is recomputed only when something other than its variable moves.
 */
import { untrack } from 'svelte';
import { materials } from '../engine/index';
import { EXPERIMENTS, answerTo, stateAt, type Experiment } from './experiments';
import {
	START,
	TIME_STOPS,
	SUPPORTS,
	positionOf,
	runLab,
	sliders,
	timeIndex,
	type LabState,
	type LabUnits
} from './lab-state';
import { lawsFor, type Law } from './laws';
import { currentX, sweep, sweepKey, type LabVariable } from './sweep';
import type { LabShape } from '../components/lab-shelf/geometry';

export const EXAGGERATIONS = [1, 2, 5, 10, 20, 50, 100, 200];
/** a movement this long after the one before starts a new ghost */
const GHOST_PAUSE_MS = 600;
const LAW_PAUSE_MS = 90;

export class LabModel {
	shelf = $state<LabState>({ ...START });
	units = $state<LabUnits>('imperial');
	selected = $state<LabVariable>('span');
	exaggeration = $state(50);
	locked = $state(false);
	ghost = $state<LabShape | null>(null);
	experiment = $state<{ e: Experiment; step: number } | null>(null);
	laws = $state<Law[]>([]);
	private lastMove = 0;
	private lastMaterial: string | null = null;

	readonly run = $derived(runLab(this.shelf));
	readonly shape = $derived<LabShape>({
		spanM: this.shelf.spanM,
		thicknessM: this.shelf.thicknessM,
		nosingM: this.shelf.nosingM,
		curve: this.run.curve
	});
	private readonly key = $derived(sweepKey(this.shelf, this.selected, this.units));
	// reads only the key, so moving the chosen variable alone keeps the curve
	readonly chart = $derived.by(() => {
		const key = this.key;
		return untrack(() => (key ? sweep(this.shelf, this.selected, this.units) : null))!;
	});
	readonly chartX = $derived(currentX(this.shelf, this.selected, this.units));
	readonly answer = $derived(
		this.experiment && this.experiment.step > 0
			? answerTo(this.experiment.e, this.experiment.step - 1)
			: null
	);

	constructor(units: LabUnits) {
		this.units = units;
		$effect(() => {
			const s = $state.snapshot(this.shelf);
			const previous = this.lastMaterial;
			const timer = setTimeout(() => (this.laws = lawsFor(s, previous)), LAW_PAUSE_MS);
			return () => clearTimeout(timer);
		});
	}

	change(patch: Partial<LabState>, variable?: LabVariable) {
		const now = performance.now();
		if (now - this.lastMove > GHOST_PAUSE_MS) this.ghost = $state.snapshot(this.shape);
		this.lastMove = now;
		if (patch.material && patch.material !== this.shelf.material)
			this.lastMaterial = this.shelf.material;
		this.shelf = { ...this.shelf, ...patch };
		if (variable) this.selected = variable;
	}

	/** One step of the chosen variable up (+1) or down (−1): the arrow keys. */
	nudge(direction: 1 | -1) {
		const s = this.shelf;
		const v = this.selected;
		const specs = sliders(this.units);
		const move = (key: keyof typeof specs) => {
			const spec = specs[key];
			const next = positionOf(spec, s[key]) + direction * spec.step;
			this.change({ [key]: spec.toSI(Math.min(spec.max, Math.max(spec.min, next))) });
		};
		const cycle = <T>(list: T[], current: T) =>
			list[Math.min(list.length - 1, Math.max(0, list.indexOf(current) + direction))];
		if (v === 'span') move('spanM');
		else if (v === 'thickness') move('thicknessM');
		else if (v === 'depth') move('depthM');
		else if (v === 'load') move(s.loadKind === 'books' ? 'booksNPerM' : 'pointN');
		else if (v === 'time')
			this.change({
				days: TIME_STOPS[
					Math.min(TIME_STOPS.length - 1, Math.max(0, timeIndex(s.days) + direction))
				].days
			});
		else if (v === 'material')
			this.change({
				material: cycle(
					materials.map((m) => m.id),
					s.material
				)
			});
		else
			this.change({
				support: cycle(
					SUPPORTS.map((o) => o.id),
					s.support
				)
			});
	}

	start(id: string) {
		const e = EXPERIMENTS.find((x) => x.id === id);
		if (!e) return;
		this.experiment = { e, step: 0 };
		this.ghost = null;
		this.shelf = stateAt(e, 0);
	}

	/** The experiment's next step (space): the shelf before stays as the ghost. */
	step(direction: 1 | -1 = 1) {
		const x = this.experiment;
		if (!x) return;
		const next = Math.min(x.e.steps.length - 1, Math.max(0, x.step + direction));
		if (next === x.step) return;
		this.ghost = $state.snapshot(this.shape);
		this.lastMove = performance.now();
		this.experiment = { e: x.e, step: next };
		this.shelf = stateAt(x.e, next);
	}

	stop() {
		this.experiment = null;
	}
}
