/** Small server-drawn plots (SVG paths) for lists: no script, no chart library. */

/** The plot box, in SVG user units. */
export interface SparkBox {
  width: number;
  height: number;
  /** Inner margin so strokes are not clipped. */
  pad: number;
}

export const SPARK_BOX: SparkBox = { width: 240, height: 64, pad: 3 };

/** SVG path data for each of several series over a shared x, scaled together into the box. */
export function sparkPaths(x: number[], series: number[][], box: SparkBox = SPARK_BOX): string[] {
  if (x.length < 2) return series.map(() => '');
  const all = series.flat().filter(Number.isFinite);
  const yMin = Math.min(...all);
  const yMax = Math.max(...all);
  const x0 = x[0];
  const xSpan = x[x.length - 1] - x0 || 1;
  const ySpan = yMax - yMin || 1;
  const w = box.width - 2 * box.pad;
  const h = box.height - 2 * box.pad;
  const px = (v: number) => round(box.pad + ((v - x0) / xSpan) * w);
  const py = (v: number) => round(box.pad + h - ((v - yMin) / ySpan) * h);
  return series.map((ys) => ys.map((y, i) => `${i === 0 ? 'M' : 'L'}${px(x[i])} ${py(y)}`).join(''));
}

/** Every n-th index so that at most `max` points remain (first and last kept). */
export function thinIndices(n: number, max: number): number[] {
  if (n <= max) return Array.from({ length: n }, (_, i) => i);
  const step = (n - 1) / (max - 1);
  return Array.from({ length: max }, (_, i) => Math.round(i * step));
}

function round(v: number): number {
  return Math.round(v * 10) / 10;
}
