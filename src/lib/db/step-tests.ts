import type { Knex } from 'knex';
import type { ColumnMapping, Dialect } from '../fielddata/csv';

/** A stored step test as the API returns it. */
export interface StepTestRecord {
  id: number;
  /** ISA-5.1 tag of the loop tested. */
  tag: string;
  /** Plant area code or null. */
  area: string | null;
  note: string;
  uploadedBy: string;
  uploadedAt: string;
  /** The user's file name: a label only, never a path. */
  originalName: string;
  storedName: string;
  bytes: number;
  sha256: string;
  mapping: ColumnMapping;
  dialect: Dialect;
  rowCount: number;
}

type Row = {
  id: number; tag: string; area: string | null; note: string; uploaded_by: string; uploaded_at: string;
  original_name: string; stored_name: string; bytes: number; sha256: string; mapping: string; dialect: string; row_count: number;
};

export type NewStepTest = Omit<StepTestRecord, 'id'>;

/** Inserts a step test and answers its id. */
export async function insertStepTest(knex: Knex, s: NewStepTest): Promise<number> {
  const [row] = await knex('step_tests')
    .insert({
      tag: s.tag, area: s.area, note: s.note, uploaded_by: s.uploadedBy, uploaded_at: s.uploadedAt,
      original_name: s.originalName, stored_name: s.storedName, bytes: s.bytes, sha256: s.sha256,
      mapping: JSON.stringify(s.mapping), dialect: JSON.stringify(s.dialect), row_count: s.rowCount,
    })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

/** One step test, or null. */
export async function findStepTest(knex: Knex, id: number): Promise<StepTestRecord | null> {
  const row = await knex<Row>('step_tests').where({ id }).first();
  return row ? fromRow(row) : null;
}

/** Step tests, newest first. */
export async function listStepTests(knex: Knex, limit = 100): Promise<StepTestRecord[]> {
  const rows = await knex<Row>('step_tests').orderBy('id', 'desc').limit(limit);
  return rows.map(fromRow);
}

function fromRow(r: Row): StepTestRecord {
  return {
    id: r.id, tag: r.tag, area: r.area, note: r.note, uploadedBy: r.uploaded_by, uploadedAt: r.uploaded_at,
    originalName: r.original_name, storedName: r.stored_name, bytes: r.bytes, sha256: r.sha256,
    mapping: JSON.parse(r.mapping), dialect: JSON.parse(r.dialect), rowCount: r.row_count,
  };
}
