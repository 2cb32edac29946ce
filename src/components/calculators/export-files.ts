import type uPlot from 'uplot';
import { chartLegend } from './chart-legend';

/** Hands a file to the browser's download, named as given. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/**
 * One PNG of the charts stacked, each under its title with a colour key of its lines, on the
 * page's paper colour: uPlot draws plot and axes on a canvas, but its legend is HTML.
 */
export async function chartsToPng(charts: ReadonlyArray<{ title: string; chart: uPlot }>): Promise<Blob> {
  const ratio = window.devicePixelRatio || 1;
  const pad = 12 * ratio;
  const head = 40 * ratio;
  const width = Math.max(...charts.map((c) => c.chart.ctx.canvas.width)) + 2 * pad;
  const height = charts.reduce((h, c) => h + head + c.chart.ctx.canvas.height + pad, pad);
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw the chart image.');
  const style = getComputedStyle(document.documentElement);
  ctx.fillStyle = style.getPropertyValue('--color-panel').trim() || '#ffffff';
  ctx.fillRect(0, 0, width, height);
  const ink = style.getPropertyValue('--color-ink').trim() || '#222222';
  let y = pad;
  for (const { title, chart } of charts) {
    ctx.fillStyle = ink;
    ctx.font = `600 ${14 * ratio}px Literata, serif`;
    ctx.fillText(title, pad, y + 14 * ratio);
    let x = pad;
    ctx.font = `${11 * ratio}px "IBM Plex Mono", monospace`;
    for (const { label, color } of chartLegend(chart)) {
      ctx.fillStyle = color;
      ctx.fillRect(x, y + 24 * ratio, 14 * ratio, 4 * ratio);
      ctx.fillStyle = ink;
      ctx.fillText(label, x + 18 * ratio, y + 30 * ratio);
      x += ctx.measureText(label).width + 30 * ratio;
    }
    y += head;
    ctx.drawImage(chart.ctx.canvas, pad, y);
    y += chart.ctx.canvas.height + pad;
  }
  return new Promise((resolve, reject) =>
    canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The chart image could not be made.'))), 'image/png'),
  );
}

/** Puts text on the clipboard; falls back to a hidden field where the async API is refused. */
export async function copyText(text: string): Promise<void> {
  try {
    await navigator.clipboard.writeText(text);
    return;
  } catch {
    const area = document.createElement('textarea');
    area.value = text;
    area.setAttribute('readonly', '');
    area.style.position = 'fixed';
    area.style.opacity = '0';
    document.body.append(area);
    area.select();
    const done = document.execCommand('copy');
    area.remove();
    if (!done) throw new Error('The browser did not allow copying; select the text and copy it by hand.');
  }
}
