import fc from 'fast-check';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Numbers that break careless numerics: extremes, signed zero, subnormals, huge counts. */
export const awkwardNumber = fc.constantFrom(
  0, -0, -1, 1, 0.5, 1e-300, 5e-324, -1e-300, 1e300, 1.7976931348623157e308, -1e308,
  2 ** 53, 1e6, 1e7, 100_000, 100_001, 20, 21, 1e-9, 3.0000000001,
);

/** A replacement value: an awkward number, a number as text, or any JSON value. */
export const replacement: fc.Arbitrary<Json> = fc.oneof(
  { weight: 4, arbitrary: awkwardNumber },
  { weight: 1, arbitrary: fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e3', '', 'zoh', 'ideal') },
  { weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json> },
  { weight: 1, arbitrary: fc.constant(null) },
);

export interface Mutation {
  /** Picks, at each level, which child to descend into (taken modulo the number of children). */
  steps: number[];
  op: 'replace' | 'delete' | 'add-key' | 'wrap' | 'stringify' | 'repeat' | 'scale';
  value: Json;
  factor: number;
}

export const mutation: fc.Arbitrary<Mutation> = fc.record({
  steps: fc.array(fc.nat(), { minLength: 0, maxLength: 5 }),
  op: fc.constantFrom('replace', 'delete', 'add-key', 'wrap', 'stringify', 'repeat', 'scale'),
  value: replacement,
  factor: fc.constantFrom(-1, 0, 1e-12, 1e-3, 10, 1e6, 1e12, 1e200),
});

function children(node: Json): (string | number)[] {
  if (Array.isArray(node)) return node.map((_, i) => i);
  if (node !== null && typeof node === 'object') return Object.keys(node);
  return [];
}

function apply(node: Json, m: Mutation): Json {
  switch (m.op) {
    case 'replace':
      return m.value;
    case 'wrap':
      return [node];
    case 'stringify':
      return typeof node === 'number' ? String(node) : JSON.stringify(node);
    case 'scale':
      return typeof node === 'number' ? node * m.factor : Array.isArray(node) ? node.map((v) => (typeof v === 'number' ? v * m.factor : v)) : m.value;
    case 'repeat':
      return Array.isArray(node) ? Array.from({ length: Math.min(400, node.length * 25 + 1) }, (_, i) => node[i % Math.max(1, node.length)] ?? 0) : node;
    case 'add-key':
      return node !== null && typeof node === 'object' && !Array.isArray(node) ? { ...node, extraKey: m.value } : m.value;
    default:
      return node;
  }
}

/** Applies one mutation at the node the steps lead to (a copy; the input is untouched). */
export function mutate(root: Json, m: Mutation): Json {
  const copy = structuredClone(root);
  const path: (string | number)[] = [];
  let node = copy;
  for (const step of m.steps) {
    const keys = children(node);
    if (keys.length === 0) break;
    const key = keys[step % keys.length]!;
    path.push(key);
    node = (node as Record<string | number, Json>)[key]!;
  }
  if (path.length === 0) return m.op === 'delete' ? {} : apply(copy, m);
  const parentPath = path.slice(0, -1);
  const last = path[path.length - 1]!;
  let parent = copy as Record<string | number, Json>;
  for (const key of parentPath) parent = parent[key] as Record<string | number, Json>;
  if (m.op === 'delete') {
    if (Array.isArray(parent)) parent.splice(Number(last), 1);
    else delete parent[last];
  } else {
    parent[last] = apply(node, m);
  }
  return copy;
}
