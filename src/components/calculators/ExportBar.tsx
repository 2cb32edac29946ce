import { useRef, useState } from 'react';
import type uPlot from 'uplot';
import { buildCsv, exportFileName, type CsvColumn } from '../../lib/calculators/csv';
import { chartsToPng, copyText, downloadBlob } from './export-files';

export interface ExportBarProps {
  /** The island id, used in file names. */
  id: string;
  /** The data behind the charts, built only when asked for. */
  csv?: () => CsvColumn[];
  /** The charts to put in the PNG, read when asked for. */
  charts?: () => ReadonlyArray<{ title: string; chart: uPlot | null }>;
  /** The settings as plain text for a colleague or a PLC worksheet. */
  copy?: () => string;
  /** What the copied text is, for the confirmation ("tuning", "coefficients"). */
  copyWhat?: string;
}

/** Download the data as CSV, the chart as PNG, copy the settings, with a spoken confirmation. */
export default function ExportBar({ id, csv, charts, copy, copyWhat = 'settings' }: ExportBarProps) {
  const [status, setStatus] = useState('');
  const clear = useRef<ReturnType<typeof setTimeout> | null>(null);
  const say = (text: string) => {
    setStatus(text);
    if (clear.current) clearTimeout(clear.current);
    clear.current = setTimeout(() => setStatus(''), 4000);
  };
  const guard = (action: () => Promise<void> | void) => async () => {
    try {
      await action();
    } catch (error) {
      say(error instanceof Error ? error.message : 'That did not work; try again.');
    }
  };

  const saveCsv = guard(() => {
    if (!csv) return;
    const name = exportFileName(id, 'data', 'csv');
    downloadBlob(new Blob([buildCsv(csv())], { type: 'text/csv;charset=utf-8' }), name);
    say(`Saved ${name}.`);
  });
  const savePng = guard(async () => {
    if (!charts) return;
    const ready = charts().filter((c): c is { title: string; chart: uPlot } => c.chart !== null);
    if (ready.length === 0) return say('The chart has not been drawn yet.');
    const name = exportFileName(id, 'chart', 'png');
    downloadBlob(await chartsToPng(ready), name);
    say(`Saved ${name}.`);
  });
  const copySettings = guard(async () => {
    if (!copy) return;
    await copyText(copy());
    say(`Copied the ${copyWhat} to the clipboard.`);
  });

  return (
    <div className="calc-export no-print" role="group" aria-label="Export">
      {csv ? <button type="button" className="calc-button" onClick={saveCsv} data-testid={`${id}-csv`}>Data as CSV</button> : null}
      {charts ? <button type="button" className="calc-button" onClick={savePng} data-testid={`${id}-png`}>Chart as PNG</button> : null}
      {copy ? <button type="button" className="calc-button" onClick={copySettings} data-testid={`${id}-copy`}>Copy {copyWhat}</button> : null}
      <span className="calc-status" role="status" aria-live="polite" data-testid={`${id}-status`}>{status}</span>
    </div>
  );
}
