import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { databasePath } from '../db/config';

/** Folder of stored step-test files: `step-tests/` beside the database file (so tests stay isolated). */
export function stepTestFolder(dbFile: string = databasePath()): string {
  return path.join(path.dirname(dbFile), 'step-tests');
}

/** A fresh stored name: random, so no user input ever becomes part of a path. */
export function generatedName(): string {
  return `${crypto.randomUUID()}.csv`;
}

/** Resolves a stored name inside the folder, refusing anything that is not a generated name. */
export function storedPath(folder: string, storedName: string): string {
  if (!/^[0-9a-f-]{36}\.csv$/.test(storedName)) throw new Error(`Not a stored step-test name: ${storedName}`);
  return path.join(folder, storedName);
}

/** Writes bytes to a temporary file in the folder (same file system, so the final move is a rename). */
export function writeTemporary(folder: string, bytes: Uint8Array): string {
  fs.mkdirSync(folder, { recursive: true });
  const tmp = path.join(folder, `.incoming-${crypto.randomUUID()}.part`);
  fs.writeFileSync(tmp, bytes, { flag: 'wx' });
  return tmp;
}

/** Removes a file if it is there. */
export function removeQuietly(file: string | null): void {
  if (file) fs.rmSync(file, { force: true });
}
