import { z } from 'zod';

/** How the time column is written: seconds, other durations, or dates and times. */
export const TimeUnitSchema = z.enum(['s', 'ms', 'min', 'h', 'timestamp']);
export type TimeUnit = z.infer<typeof TimeUnitSchema>;

/** Seconds per unit of a numeric time column. */
export const SECONDS_PER: Record<Exclude<TimeUnit, 'timestamp'>, number> = { s: 1, ms: 0.001, min: 60, h: 3600 };

/** An engineering unit label as the plant writes it ("°C", "%", "m³/h"); free text, short. */
const UnitLabel = z.string().trim().max(24, 'A unit is at most 24 characters.');
/** A 1-based column number in the file. */
const ColumnNumber = z.number().int('A column is a whole number.').min(1, 'Columns are numbered from 1.');

/** Which columns of the file hold time, process value and (optionally) controller output. */
export const ColumnMappingSchema = z.object({
  time: z.object({
    /** 1-based column of the time stamps. */
    column: ColumnNumber,
    /** How the time is written; converted to seconds from the first row. */
    unit: TimeUnitSchema,
  }),
  pv: z.object({
    /** 1-based column of the process value. */
    column: ColumnNumber,
    /** Engineering unit of the process value. */
    unit: UnitLabel,
  }),
  /** Controller output (the step); null when the file has none (a unit step at t = 0 is assumed). */
  co: z
    .object({
      /** 1-based column of the controller output. */
      column: ColumnNumber,
      /** Engineering unit of the output, usually %. */
      unit: UnitLabel,
    })
    .nullable()
    .default(null),
});

export type ColumnMapping = z.infer<typeof ColumnMappingSchema>;
