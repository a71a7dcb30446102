export interface SagSeries {
	id: string;
	label: string;
	/** [span, sag] in metres, spans increasing */
	points: [number, number][];
}
