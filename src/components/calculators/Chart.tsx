import { useEffect, useLayoutEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { resolvePalette, type ChartColor } from './chart-colors';
import { setChartLegend } from './chart-legend';

/** One plotted line. */
export interface ChartSeries {
  label: string;
  color: ChartColor;
  /** Dash pattern in px, e.g. [6, 4]; solid when absent. */
  dash?: number[];
  width?: number;
  /** The unit shown after values in the cursor read-out. */
  unit?: string;
  /** Draw the samples as dots without a line (a single point such as −1 on a Nyquist plot). */
  dots?: boolean;
  /** Hold each value until the next sample (a sampled signal through a zero-order hold). */
  stepped?: boolean;
}

/** Bounds an automatic axis may not pass (the phase of a long dead time, a Nyquist curve running off to infinity). */
export interface AxisRange {
  min?: number;
  max?: number;
  /** Show exactly min to max whatever the data (a Nyquist view around −1). */
  fixed?: boolean;
}

/** A straight guide line: a crossover frequency, a setpoint, a claim's bound. */
export interface ChartMarker {
  axis: 'x' | 'y';
  value: number;
  label: string;
  color: ChartColor;
}

export interface ChartProps {
  /** Accessible name of the chart, also the PNG title. */
  title: string;
  xLabel: string;
  yLabel: string;
  series: ChartSeries[];
  /** Mode 1: [x, y1, y2, …] with shared sorted x. Mode 2 (xy curves): [null, [x, y], [x, y], …]. */
  data: uPlot.AlignedData | (null | [number[], number[]])[];
  height?: number;
  logX?: boolean;
  /** xy curves (Nyquist) instead of series over a shared x. */
  xy?: boolean;
  /** As tall as wide (up to `height`), so equal spans on both axes keep circles round. */
  square?: boolean;
  markers?: ChartMarker[];
  xRange?: AxisRange;
  yRange?: AxisRange;
  /** Receives the chart when it is created (null when it goes), for PNG export. */
  onChart?: (chart: uPlot | null) => void;
  testId?: string;
}

function readout(value: number | null, unit?: string): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = String(Number(value.toPrecision(4)));
  return unit ? `${text} ${unit}` : text;
}

/** A uPlot range function: the data's extent padded 5 %, but never beyond the given bounds. */
function limit(range: AxisRange): uPlot.Range.Function {
  return (_u, dataMin, dataMax) => {
    if (range.fixed && range.min !== undefined && range.max !== undefined) return [range.min, range.max];
    const span = Math.abs(dataMax - dataMin) || Math.abs(dataMax) || 1;
    const lo = Math.max(dataMin - 0.05 * span, range.min ?? -Infinity);
    const hi = Math.min(dataMax + 0.05 * span, range.max ?? Infinity);
    return hi > lo ? [lo, hi] : [lo, lo + 1];
  };
}

function drawMarkers(u: uPlot, markers: readonly ChartMarker[], palette: Record<ChartColor, string>) {
  const { ctx, bbox } = u;
  ctx.save();
  ctx.lineWidth = 1.5 * devicePixelRatio;
  ctx.setLineDash([4 * devicePixelRatio, 4 * devicePixelRatio]);
  ctx.font = `${11 * devicePixelRatio}px "IBM Plex Mono", monospace`;
  let row = 0;
  for (const m of markers) {
    ctx.strokeStyle = ctx.fillStyle = palette[m.color];
    ctx.beginPath();
    if (m.axis === 'x') {
      const x = u.valToPos(m.value, 'x', true);
      if (!(x >= bbox.left && x <= bbox.left + bbox.width)) continue;
      ctx.moveTo(x, bbox.top);
      ctx.lineTo(x, bbox.top + bbox.height);
      ctx.stroke();
      ctx.fillText(m.label, x + 4 * devicePixelRatio, bbox.top + (12 + 14 * row++) * devicePixelRatio);
    } else {
      const y = u.valToPos(m.value, 'y', true);
      if (!(y >= bbox.top && y <= bbox.top + bbox.height)) continue;
      ctx.moveTo(bbox.left, y);
      ctx.lineTo(bbox.left + bbox.width, y);
      ctx.stroke();
      const width = ctx.measureText(m.label).width;
      ctx.fillText(m.label, bbox.left + bbox.width - width - 4 * devicePixelRatio, y - 4 * devicePixelRatio);
    }
  }
  ctx.restore();
}

/**
 * A uPlot chart: drag to zoom (double-click resets), the legend reads values under the cursor.
 * Created once in an effect; new data is drawn synchronously in a layout effect so the caller
 * can time recompute-and-redraw. The reserved height keeps the page from jumping at hydration.
 */
export default function Chart(props: ChartProps) {
  const { title, xLabel, yLabel, series, data, height = 260, logX = false, xy = false, markers = [], xRange, yRange, square = false, onChart, testId } = props;
  const box = useRef<HTMLDivElement>(null);
  const chart = useRef<uPlot | null>(null);
  const markerRef = useRef(markers);
  markerRef.current = markers;
  const dataRef = useRef(data);
  dataRef.current = data;
  const shape = JSON.stringify({ series, logX, xy, xLabel, yLabel, height, xRange, yRange, square });
  const sizeOf = (el: HTMLElement) => {
    const width = Math.max(200, el.clientWidth);
    if (!square) return { width, height };
    const side = Math.min(width, height);
    return { width: side, height: side };
  };

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    let theme = document.documentElement.dataset.theme;
    const create = () => {
      chart.current?.destroy();
      const palette = resolvePalette();
      const ink = palette.ink;
      const grid = palette.rule;
      const axis = { stroke: ink, grid: { stroke: grid, width: 1 }, ticks: { stroke: grid, width: 1 }, font: '12px "IBM Plex Mono", monospace', labelFont: '12px "Literata", serif' };
      const opts: uPlot.Options = {
        ...sizeOf(el),
        mode: xy ? 2 : 1,
        scales: {
          x: { time: false, distr: logX ? 3 : 1, ...(xRange ? { range: limit(xRange) } : {}) },
          y: yRange ? { range: limit(yRange) } : {},
        },
        axes: [
          { ...axis, label: xLabel },
          { ...axis, label: yLabel, size: 56 },
        ],
        legend: { live: !xy },
        cursor: { drag: { x: true, y: xy } },
        series: [
          xy ? {} : { label: xLabel, value: (_u, v) => readout(v) },
          ...series.map((s) => ({
            label: s.label,
            stroke: palette[s.color],
            width: s.width ?? 2,
            dash: s.dash,
            points: s.dots ? { show: true, size: 8, fill: palette[s.color] } : { show: false },
            ...(s.dots ? { paths: () => null } : {}),
            ...(s.stepped ? { paths: uPlot.paths.stepped!({ align: 1 }) } : {}),
            value: (_u: uPlot, v: number | null) => readout(v, s.unit),
            ...(xy ? { facets: [{ scale: 'x', auto: true }, { scale: 'y', auto: true }] } : {}),
          })),
        ] as uPlot.Series[],
        hooks: { draw: [(u) => drawMarkers(u, markerRef.current, palette)] },
      };
      chart.current = new uPlot(opts, dataRef.current as uPlot.AlignedData, el);
      setChartLegend(chart.current, series.map((s) => ({ label: s.label, color: palette[s.color] })));
      onChart?.(chart.current);
    };
    create();
    const resize = new ResizeObserver(() => {
      const size = sizeOf(el);
      if (chart.current && chart.current.width !== size.width) chart.current.setSize(size);
    });
    resize.observe(el);
    const palette = new MutationObserver(() => {
      if (document.documentElement.dataset.theme !== theme) {
        theme = document.documentElement.dataset.theme;
        create();
      }
    });
    palette.observe(document.documentElement, { attributes: true, attributeFilter: ['data-theme'] });
    return () => {
      resize.disconnect();
      palette.disconnect();
      chart.current?.destroy();
      chart.current = null;
      onChart?.(null);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [shape]);

  useLayoutEffect(() => {
    const u = chart.current;
    if (!u) return;
    u.batch(() => u.setData(data as uPlot.AlignedData));
  }, [data]);

  useLayoutEffect(() => {
    chart.current?.redraw(false, false);
  }, [JSON.stringify(markers)]);

  return (
    <figure className="calc-chart" data-testid={testId} aria-label={title} role="group">
      <div ref={box} style={{ minHeight: height + 40 + 24 * Math.floor(series.length / 4) }} className="calc-chart-plot" />
      <figcaption className="sr-only">{title}</figcaption>
    </figure>
  );
}
