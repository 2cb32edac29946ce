import type { Expression, Node, Program, Property, SpreadElement } from 'estree';

/** A value rebuilt from literals only: what a component attribute may carry. */
export type LiteralValue = string | number | boolean | null | LiteralValue[] | { [key: string]: LiteralValue };

/** Either the rebuilt value or the node that is not a literal, with why. */
export type LiteralResult = { ok: true; value: LiteralValue } | { ok: false; node: Node; reason: string };

/**
 * Rebuilds the value of an attribute expression (`{…}`) from literals: strings, finite numbers,
 * booleans, null, a leading minus, arrays and plain objects with literal keys. Anything else —
 * identifiers, calls, templates, computed keys, spreads — is refused, never evaluated.
 */
export function literalFromProgram(program: Program | undefined): LiteralResult {
  const body = program?.body ?? [];
  if (body.length !== 1 || body[0].type !== 'ExpressionStatement') {
    return { ok: false, node: (program ?? body[0]) as Node, reason: 'An attribute value must be one literal value.' };
  }
  return literalFromExpression(body[0].expression);
}

function literalFromExpression(node: Expression | SpreadElement | null): LiteralResult {
  if (!node) return { ok: false, node: node as unknown as Node, reason: 'Arrays may not have holes.' };
  switch (node.type) {
    case 'Literal': {
      const v = node.value;
      if (v === null || typeof v === 'string' || typeof v === 'boolean') return { ok: true, value: v };
      if (typeof v === 'number' && Number.isFinite(v)) return { ok: true, value: v };
      return { ok: false, node, reason: 'Only strings, finite numbers, true, false and null are allowed (no regular expressions or big integers).' };
    }
    case 'UnaryExpression': {
      if (node.operator !== '-' && node.operator !== '+') break;
      const inner = literalFromExpression(node.argument);
      if (!inner.ok) return inner;
      if (typeof inner.value !== 'number') return { ok: false, node, reason: 'A sign may only stand before a number.' };
      return { ok: true, value: node.operator === '-' ? -inner.value : inner.value };
    }
    case 'ArrayExpression': {
      const out: LiteralValue[] = [];
      for (const el of node.elements) {
        if (el?.type === 'SpreadElement') return { ok: false, node: el, reason: 'Spreads (...) are not allowed.' };
        const r = literalFromExpression(el);
        if (!r.ok) return r;
        out.push(r.value);
      }
      return { ok: true, value: out };
    }
    case 'ObjectExpression': {
      const out: { [key: string]: LiteralValue } = Object.create(null);
      for (const prop of node.properties) {
        if (prop.type !== 'Property') return { ok: false, node: prop, reason: 'Spreads (...) are not allowed.' };
        const key = propertyKey(prop);
        if (key === null) return { ok: false, node: prop, reason: 'Object keys must be plain names or strings, with a value (no methods, getters or computed keys).' };
        if (key === '__proto__' || key === 'constructor' || key === 'prototype') {
          return { ok: false, node: prop, reason: `The key "${key}" is not allowed.` };
        }
        const r = literalFromExpression(prop.value as Expression);
        if (!r.ok) return r;
        out[key] = r.value;
      }
      return { ok: true, value: { ...out } };
    }
    default:
      break;
  }
  return { ok: false, node, reason: `Only literal values are allowed here, not a ${describeNode(node.type)}.` };
}

function propertyKey(prop: Property): string | null {
  if (prop.computed || prop.method || prop.shorthand || prop.kind !== 'init') return null;
  if (prop.key.type === 'Identifier') return prop.key.name;
  if (prop.key.type === 'Literal' && (typeof prop.key.value === 'string' || typeof prop.key.value === 'number')) return String(prop.key.value);
  return null;
}

const NODE_WORDS: Record<string, string> = {
  Identifier: 'variable name',
  CallExpression: 'function call',
  TemplateLiteral: 'template string',
  ArrowFunctionExpression: 'function',
  FunctionExpression: 'function',
  MemberExpression: 'property access',
  BinaryExpression: 'calculation',
  LogicalExpression: 'logical expression',
  ConditionalExpression: 'conditional',
  NewExpression: '`new` expression',
  JSXElement: 'JSX element',
  AssignmentExpression: 'assignment',
  TaggedTemplateExpression: 'tagged template',
  ImportExpression: 'dynamic import',
};

function describeNode(type: string): string {
  return NODE_WORDS[type] ?? `${type.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}`;
}
