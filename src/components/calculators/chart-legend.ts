import type uPlot from 'uplot';

/** One line of a chart as its key shows it. */
export interface LegendEntry {
  label: string;
  /** The resolved CSS colour. */
  color: string;
}

// Kept apart from Chart.tsx so that exporting needs no uPlot in islands without charts.
const legends = new WeakMap<uPlot, LegendEntry[]>();

export function setChartLegend(chart: uPlot, entries: LegendEntry[]): void {
  legends.set(chart, entries);
}

/** The lines of a chart drawn by Chart.tsx, with their colours (for the PNG export). */
export function chartLegend(chart: uPlot): LegendEntry[] {
  return legends.get(chart) ?? [];
}
