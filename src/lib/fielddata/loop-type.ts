/**
 * The loop type an ISA-5.1 tag suggests, from its first letter (the measured variable in
 * ISA-5.1: F flow, L level, T temperature, P pressure, S speed, Z/G position, A analysis).
 * Analysis loops in this plant are pH loops unless told otherwise. A suggestion only: the
 * step-test page lets the user change it.
 */
const BY_LETTER: Record<string, string> = {
  F: 'flow', L: 'level', T: 'temperature', P: 'pressure', S: 'speed', Z: 'position', G: 'position', A: 'ph', Q: 'composition',
};

export function loopTypeOfTag(tag: string): string {
  return BY_LETTER[tag.trim().charAt(0).toUpperCase()] ?? 'other';
}
