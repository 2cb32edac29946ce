/**
 * Blocks of a chain as transfer functions in the contract's shape (num/den in descending
 * powers of s, delay in s). Combining them is the engine's `chain` (connect.ts).
 */
import type { Block } from '../schemas/block';

/** num(s)/den(s)·e^(−delay·s), as the engine and the contract take it. */
export interface BlockTf {
  num: number[];
  den: number[];
  delay: number;
}

/** The transfer function of one block. */
export function blockToTf(block: Block): BlockTf {
  switch (block.kind) {
    case 'gain':
      return { num: [block.k], den: [1], delay: 0 };
    case 'first-order':
      return { num: [block.k], den: [block.tau, 1], delay: 0 };
    case 'second-order': {
      const w2 = block.wn * block.wn;
      return { num: [block.k * w2], den: [1, 2 * block.zeta * block.wn, w2], delay: 0 };
    }
    case 'dead-time':
      return { num: [1], den: [1], delay: block.theta };
    case 'integrator':
      return { num: [block.k], den: [1, 0], delay: 0 };
    case 'lead-lag':
      return { num: block.tLead > 0 ? [block.k * block.tLead, block.k] : [block.k], den: [block.tLag, 1], delay: 0 };
    case 'custom':
      return { num: [...block.num], den: [...block.den], delay: 0 };
  }
}

/** A short name for each kind, as the chain editor lists them. */
export const BLOCK_NAMES: Record<Block['kind'], string> = {
  gain: 'Gain',
  'first-order': 'First-order lag',
  'second-order': 'Second-order',
  'dead-time': 'Dead time',
  integrator: 'Integrator',
  'lead-lag': 'Lead–lag',
  custom: 'Custom num/den',
};

/** A new block of a kind, with values a first look at a dairy loop would start from. */
export function defaultBlock(kind: Block['kind']): Block {
  switch (kind) {
    case 'gain':
      return { kind, k: 1 };
    case 'first-order':
      return { kind, k: 1, tau: 10 };
    case 'second-order':
      return { kind, k: 1, wn: 0.5, zeta: 0.7 };
    case 'dead-time':
      return { kind, theta: 2 };
    case 'integrator':
      return { kind, k: 0.01 };
    case 'lead-lag':
      return { kind, k: 1, tLead: 5, tLag: 10 };
    case 'custom':
      return { kind, num: [1], den: [4, 1] };
  }
}

/** Moves the item at `from` to `to` (both clamped), returning a new array. */
export function moveItem<T>(items: readonly T[], from: number, to: number): T[] {
  const next = [...items];
  if (from < 0 || from >= next.length) return next;
  const [item] = next.splice(from, 1);
  next.splice(Math.max(0, Math.min(to, next.length)), 0, item as T);
  return next;
}
