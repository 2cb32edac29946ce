/** The shapes the field-data routes answer with, as the islands use them. */
import type { ProcessModel } from '../../lib/control/types';
import type { ColumnMapping } from '../../lib/fielddata/csv/mapping';
import type { RecipeMatch } from '../../lib/fielddata/match';

export type { ColumnMapping, ProcessModel, RecipeMatch };

export interface Preview {
  dialect: { delimiter: string; decimal: string };
  header: string[] | null;
  columns: number;
  rowCount: number;
  rows: { line: number; cells: string[] }[];
  suggestedMapping: ColumnMapping;
  issues: { line: number | null; message: string }[];
  issueCount: number;
}

export interface StepTestInfo {
  id: number;
  tag: string;
  area: string | null;
  rowCount: number;
  mapping: ColumnMapping;
  originalName: string;
}

export interface FitView {
  id: number;
  type: 'fopdt' | 'sopdt' | 'ipdt';
  model: ProcessModel;
  fit: { rmse: number; r2: number };
  chosen: boolean;
  matches: RecipeMatch[];
}

export interface FitPlot {
  t: number[];
  pv: number[];
  co: number[] | null;
  curves: { type: FitView['type']; fitId: number | null; y: number[]; residual: number[] }[];
}

export interface FitAnswer {
  stepTest: StepTestInfo;
  loopType: string;
  fits: FitView[];
  failed?: { type: string; message: string }[];
  plot: FitPlot;
}

export interface RecipeOption {
  slug: string;
  title: string;
  loopType: string;
}
