/** One point of a plotted curve; a null y leaves a gap. */
export interface ChartPoint {
  readonly x: number;
  readonly y: number | null;
}

export interface ChartSeries {
  readonly label: string;
  readonly points: readonly ChartPoint[];
}

/** A vertical line at x with a label, e.g. the crossover temperature of a reaction. */
export interface ChartMarker {
  readonly x: number;
  readonly label: string;
}

/** The x range where the curve is valid (a fit's temperature range); outside it is shaded. */
export interface ChartRange {
  readonly min: number;
  readonly max: number;
  readonly label: string;
}

/** Colours resolved from the theme for the canvas, which cannot read CSS variables itself. */
export interface ChartColors {
  readonly series: readonly string[];
  readonly text: string;
  readonly grid: string;
  readonly outside: string;
  readonly marker: string;
}

export interface LineChartConfig {
  readonly series: readonly ChartSeries[];
  readonly xLabel: string;
  readonly yLabel: string;
  readonly validRange: ChartRange | null;
  readonly markers: readonly ChartMarker[];
  readonly colors: ChartColors;
  readonly font: string;
}
