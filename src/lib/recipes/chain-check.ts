import { chain, multiply, type TransferFunction } from '../control';
import { blockToTf } from '../calculators/blocks';
import type { RecipeFrontmatter } from './frontmatter';
import { plantOf } from './plant';

/** The product of a list of blocks, through the engine's series connection. */
export function chainTransferFunction(blocks: NonNullable<RecipeFrontmatter['chain']>['blocks']): TransferFunction {
  return chain(blocks.map(blockToTf));
}

/** Whether a/b equals c/d as rational functions (cross-multiplied, relative tolerance 1e-9), with equal delays. */
function sameTransferFunction(x: { num: number[]; den: number[]; delay: number }, y: { num: number[]; den: number[]; delay: number }): boolean {
  const left = multiply(x.num, y.den);
  const right = multiply(y.num, x.den);
  const n = Math.max(left.length, right.length);
  const pad = (p: number[]) => [...Array(n - p.length).fill(0), ...p];
  const [l, r] = [pad(left), pad(right)];
  const scale = Math.max(...l.map(Math.abs), ...r.map(Math.abs), 1e-300);
  return l.every((v, i) => Math.abs(v - r[i]) <= 1e-9 * scale) && Math.abs(x.delay - y.delay) <= 1e-9 * Math.max(1, x.delay);
}

/**
 * Sentences naming each way the recipe's blocks disagree with its model or sensor (empty when
 * they agree or when the recipe lists no blocks).
 */
export function chainMismatches(name: string, recipe: RecipeFrontmatter): string[] {
  if (!recipe.chain) return [];
  const problems: string[] = [];
  const product = chainTransferFunction(recipe.chain.blocks);
  if (!sameTransferFunction(product, plantOf(recipe.model))) {
    problems.push(`Recipe "${name}": its blocks multiply out to num [${product.num.join(', ')}] / den [${product.den.join(', ')}] with delay ${product.delay} s, which is not its model.`);
  }
  const sensor = recipe.chain.sensor ? blockToTf(recipe.chain.sensor) : null;
  const stated = recipe.sensor ? { num: recipe.sensor.num, den: recipe.sensor.den, delay: recipe.sensor.delay } : null;
  if ((sensor === null) !== (stated === null) || (sensor && stated && !sameTransferFunction(sensor, stated))) {
    problems.push(`Recipe "${name}": its sensor block does not match its sensor transfer function.`);
  }
  return problems;
}
