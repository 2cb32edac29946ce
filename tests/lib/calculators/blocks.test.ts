import { describe, expect, it } from 'vitest';
import { BLOCK_KINDS, BlockSchema, type Block } from '../../../src/lib/schemas/block';
import { blockToTf, defaultBlock, moveItem } from '../../../src/lib/calculators/blocks';

/** Evaluates num/den at a real s (Horner), to check DC gain and time constants independently. */
function at(p: number[], s: number): number {
  return p.reduce((acc, c) => acc * s + c, 0);
}

/**
 * Standard forms, Ogata, "Modern Control Engineering" 5th ed.: first-order k/(τs+1) (§5-3),
 * second-order k·ωn²/(s² + 2ζωn s + ωn²) (§5-4), integrator k/s, transport lag e^(−θs); section
 * numbers are from memory; lead–lag k(T1 s + 1)/(T2 s + 1) (§7-11).
 */
const rows: Array<{ block: Block; dcGain: number | null; poles: number[]; delay: number; source: string }> = [
  { block: { kind: 'gain', k: 0.8 }, dcGain: 0.8, poles: [], delay: 0, source: 'pure gain' },
  { block: { kind: 'first-order', k: 1.5, tau: 30 }, dcGain: 1.5, poles: [-1 / 30], delay: 0, source: 'Ogata §5-3: pole at −1/τ' },
  { block: { kind: 'second-order', k: 2, wn: 0.5, zeta: 1 }, dcGain: 2, poles: [-0.5, -0.5], delay: 0, source: 'Ogata §5-4: ζ = 1 gives a double pole at −ωn' },
  { block: { kind: 'dead-time', theta: 6 }, dcGain: 1, poles: [], delay: 6, source: 'transport lag e^(−θs), |G| = 1' },
  { block: { kind: 'integrator', k: 0.02 }, dcGain: null, poles: [0], delay: 0, source: 'integrator: pole at the origin, no DC gain' },
  { block: { kind: 'lead-lag', k: 1.2, tLead: 10, tLag: 4 }, dcGain: 1.2, poles: [-0.25], delay: 0, source: 'Ogata §7-11: pole at −1/T2' },
  { block: { kind: 'custom', num: [3], den: [2, 3, 1] }, dcGain: 3, poles: [-1, -0.5], delay: 0, source: '(2s+1)(s+1) = 2s² + 3s + 1' },
];

describe('blockToTf', () => {
  for (const row of rows) {
    it(`gives the ${row.block.kind} block its transfer function (${row.source})`, () => {
      const tf = blockToTf(row.block);
      expect(tf.delay).toBe(row.delay);
      if (row.dcGain === null) expect(at(tf.den, 0)).toBe(0);
      else expect(at(tf.num, 0) / at(tf.den, 0)).toBeCloseTo(row.dcGain, 12);
      for (const p of row.poles) expect(Math.abs(at(tf.den, p))).toBeLessThan(1e-12);
      expect(tf.den.length - 1).toBe(row.poles.length);
    });
  }

  it('puts the lead zero at −1/T_lead', () => {
    const tf = blockToTf({ kind: 'lead-lag', k: 1.2, tLead: 10, tLag: 4 });
    expect(at(tf.num, -0.1)).toBeCloseTo(0, 12);
  });
});

describe('BlockSchema', () => {
  it('accepts the default block of every kind', () => {
    for (const kind of BLOCK_KINDS) expect(BlockSchema.safeParse(defaultBlock(kind)).success).toBe(true);
    expect(BLOCK_KINDS).toHaveLength(7);
  });

  it('refuses a negative time constant, negative dead time and an all-zero denominator with a message', () => {
    const bad = [
      { kind: 'first-order', k: 1, tau: -3 },
      { kind: 'dead-time', theta: -1 },
      { kind: 'custom', num: [1], den: [0, 0] },
      { kind: 'second-order', k: 1, wn: 0, zeta: 0.5 },
      { kind: 'valve', k: 1 },
    ];
    for (const b of bad) {
      const r = BlockSchema.safeParse(b);
      expect(r.success).toBe(false);
      expect(r.error?.issues[0]?.message.length).toBeGreaterThan(5);
    }
  });
});

describe('moveItem', () => {
  it('moves an item and leaves the input untouched', () => {
    const list = ['valve', 'process', 'sensor'];
    expect(moveItem(list, 2, 0)).toEqual(['sensor', 'valve', 'process']);
    expect(moveItem(list, 0, 5)).toEqual(['process', 'sensor', 'valve']);
    expect(moveItem(list, 7, 0)).toEqual(list);
    expect(list).toEqual(['valve', 'process', 'sensor']);
  });
});
