declare module '@mapbox/shelf-pack' {
	export interface Bin {
		id: number | string;
		x: number;
		y: number;
		w: number;
		h: number;
	}
	export interface Shelf {
		x: number;
		y: number;
		w: number;
		h: number;
		free: number;
	}
	export default class ShelfPack {
		constructor(w: number, h: number, options?: { autoResize?: boolean });
		w: number;
		h: number;
		shelves: Shelf[];
		packOne(w: number, h: number, id?: number | string): Bin | null;
	}
}
