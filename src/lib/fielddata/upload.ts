import crypto from 'node:crypto';
import fs from 'node:fs';
import type { Knex } from 'knex';
import { findStepTest, insertStepTest, type StepTestRecord } from '../db/step-tests';
import { parseStepTest, type ColumnMapping, type CsvIssue, type StepSeries } from './csv';
import { generatedName, removeQuietly, storedPath, writeTemporary } from './storage';

/** What the uploader states about the test besides the file. */
export interface StepTestDetails {
  tag: string;
  area: string | null;
  note: string;
  mapping: ColumnMapping;
}

export type StoreOutcome =
  | { ok: true; stepTest: StepTestRecord; series: StepSeries }
  | { ok: false; issues: CsvIssue[]; issueCount: number };

/**
 * Stores an upload so that it is all or nothing: the bytes go to a temporary file, are parsed and
 * checked, then the row is inserted and the file renamed into place inside one transaction. A
 * rejected or failed upload leaves no file and no row behind.
 */
export async function storeStepTest(
  knex: Knex,
  folder: string,
  upload: { bytes: Uint8Array; originalName: string; details: StepTestDetails; uploadedBy: string; now?: Date },
): Promise<StoreOutcome> {
  const tmp = writeTemporary(folder, upload.bytes);
  let final: string | null = null;
  try {
    const parsed = parseStepTest(fs.readFileSync(tmp), upload.details.mapping);
    if (!parsed.ok) return { ok: false, issues: parsed.issues, issueCount: parsed.issueCount };
    const storedName = generatedName();
    const id = await knex.transaction(async (trx) => {
      const newId = await insertStepTest(trx, {
        tag: upload.details.tag,
        area: upload.details.area,
        note: upload.details.note,
        uploadedBy: upload.uploadedBy,
        uploadedAt: (upload.now ?? new Date()).toISOString(),
        originalName: safeLabel(upload.originalName),
        storedName,
        bytes: upload.bytes.byteLength,
        sha256: crypto.createHash('sha256').update(upload.bytes).digest('hex'),
        mapping: upload.details.mapping,
        dialect: parsed.table.dialect,
        rowCount: parsed.series.t.length,
      });
      final = storedPath(folder, storedName);
      fs.renameSync(tmp, final);
      return newId;
    });
    final = null; // committed: the file stays
    const stepTest = await findStepTest(knex, id);
    return { ok: true, stepTest: stepTest!, series: parsed.series };
  } finally {
    removeQuietly(tmp);
    removeQuietly(final);
  }
}

/** Reads a stored test's series back with its stored mapping. */
export function loadSeries(folder: string, stepTest: StepTestRecord): StepSeries {
  const parsed = parseStepTest(fs.readFileSync(storedPath(folder, stepTest.storedName)), stepTest.mapping);
  if (!parsed.ok) throw new Error(`Stored step test ${stepTest.id} no longer parses: ${parsed.issues[0]?.message}`);
  return parsed.series;
}

/** The user's file name as a display label: its last path part, printable, at most 120 characters. */
function safeLabel(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  return base.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 120);
}
