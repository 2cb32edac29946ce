import { STEP_TEST_LIMITS } from './limits';
import { fileIssue, type CsvIssue } from './issue';

/** The decoded text of an upload, or why it is refused. */
export type DecodedText = { text: string; issue: null } | { text: null; issue: CsvIssue };

const MB = 1024 * 1024;

/**
 * Checks the bytes themselves (never the file name): size, binary content, encoding. UTF-8 is
 * expected; a file that is not valid UTF-8 but has no control bytes is read as Windows-1252,
 * the encoding older plant historians export (° and µ in headers). Line ends become "\n"
 * and a leading byte-order mark is dropped.
 */
export function decodeUpload(bytes: Uint8Array): DecodedText {
  if (bytes.byteLength > STEP_TEST_LIMITS.maxBytes) {
    const size = (bytes.byteLength / MB).toFixed(1);
    return { text: null, issue: fileIssue(`The file is ${size} MB; a step-test file may be at most 5 MB.`) };
  }
  if (looksBinary(bytes)) {
    return {
      text: null,
      issue: fileIssue('The file is not a CSV text file (it contains binary data): export the step test as CSV and upload that.'),
    };
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    text = new TextDecoder('windows-1252').decode(bytes);
  }
  return normalizeText(text);
}

/** Drops a BOM, unifies line ends and refuses a file with no content. */
export function normalizeText(raw: string): DecodedText {
  const noBom = raw.charCodeAt(0) === 0xfeff ? raw.slice(1) : raw;
  const text = noBom.includes('\r') ? noBom.replaceAll('\r\n', '\n').replaceAll('\r', '\n') : noBom;
  if (text.trim() === '') {
    return { text: null, issue: fileIssue('The file is empty: upload a CSV file with a time column and a process-value column.') };
  }
  return { text, issue: null };
}

/** NUL bytes, or more than 1 % other control bytes in the first 64 KB, mean not text. */
function looksBinary(bytes: Uint8Array): boolean {
  const n = Math.min(bytes.byteLength, 65_536);
  let control = 0;
  for (let i = 0; i < n; i++) {
    const b = bytes[i];
    if (b === 0) return true;
    if (b < 32 && b !== 9 && b !== 10 && b !== 13 && b !== 12) control++;
  }
  return n > 0 && control / n > 0.01;
}
