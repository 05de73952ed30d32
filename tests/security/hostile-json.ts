import fc from 'fast-check';

/**
 * JSON bodies an attacker or a broken client might send, as raw text so keys such as `__proto__`
 * arrive as written (an object literal would turn them into prototypes before they are sent).
 */
export type Json = null | boolean | number | string | Json[] | { entries: [string, Json][] };

const hostileStrings = [
  'NaN', 'Infinity', '-Infinity', '1e309', '-0', '0x10', ' 12 ', '', ' ', '\u0000', '\u202e', 'null', 'undefined', 'true',
  '<script>alert(1)</script>', "' OR 1=1 --", '../../../../etc/passwd', '%00', '${7*7}', '{{7*7}}', '2026-02-30', '9999-99-99T99:99:99Z',
];
const hostileKeys = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', '__defineGetter__', '', 'id', 'unit', 'quantity', 'length'];

const leaf: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom(...hostileStrings),
  fc.string({ maxLength: 12 }),
  fc.string({ minLength: 2_000, maxLength: 6_000 }),
  fc.integer(),
  fc.double({ noNaN: true }),
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -1, 0, 0.1, 1e-300),
  fc.boolean(),
  fc.constant(null),
);

const keyArb = fc.oneof(fc.constantFrom(...hostileKeys), fc.string({ maxLength: 10 }));

export const hostileValue: fc.Arbitrary<Json> = fc.letrec<{ node: Json }>((tie) => ({
  node: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    leaf,
    fc.array(tie('node'), { maxLength: 4 }),
    fc.array(fc.tuple(keyArb, tie('node')), { maxLength: 5 }).map((entries) => ({ entries })),
  ),
})).node;

/** A valid example body with one field (at any depth) replaced by a hostile value, or a hostile key added. */
export function mutated(example: unknown): fc.Arbitrary<Json> {
  const base = toJson(example);
  const paths = leafPaths(base);
  return fc.tuple(fc.constantFrom(...(paths.length ? paths : [[]])), hostileValue, fc.boolean()).map(([path, value, addKey]) =>
    addKey ? withKey(base, path.slice(0, -1), '__proto__', value) : replaceAt(base, path, value),
  );
}

export function toJson(value: unknown): Json {
  if (value === null || typeof value !== 'object') return (value ?? null) as Json;
  if (Array.isArray(value)) return value.map(toJson);
  return { entries: Object.entries(value).map(([k, v]) => [k, toJson(v)]) };
}

export function serialize(value: Json): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(serialize).join(',')}]`;
  return `{${value.entries.map(([k, v]) => `${JSON.stringify(k)}:${serialize(v)}`).join(',')}}`;
}

/** JSON nested `depth` levels deep, built as text (a parser's or validator's recursion is the target). */
export const deeplyNested = (depth: number) => `${'{"a":['.repeat(depth)}1${']}'.repeat(depth)}`;

type Path = (string | number)[];

function leafPaths(value: Json, path: Path = []): Path[] {
  if (value === null || typeof value !== 'object') return [path];
  if (Array.isArray(value)) return [path, ...value.flatMap((v, i) => leafPaths(v, [...path, i]))];
  return [path, ...value.entries.flatMap(([k, v]) => leafPaths(v, [...path, k]))];
}

function replaceAt(value: Json, path: Path, replacement: Json): Json {
  if (path.length === 0) return replacement;
  const [head, ...rest] = path;
  if (Array.isArray(value)) return value.map((v, i) => (i === head ? replaceAt(v, rest, replacement) : v));
  if (value && typeof value === 'object') return { entries: value.entries.map(([k, v]) => [k, k === head ? replaceAt(v, rest, replacement) : v]) };
  return value;
}

function withKey(value: Json, path: Path, key: string, added: Json): Json {
  if (path.length === 0) return value && typeof value === 'object' && !Array.isArray(value) ? { entries: [...value.entries, [key, added]] } : value;
  const [head, ...rest] = path;
  if (Array.isArray(value)) return value.map((v, i) => (i === head ? withKey(v, rest, key, added) : v));
  if (value && typeof value === 'object') return { entries: value.entries.map(([k, v]) => [k, k === head ? withKey(v, rest, key, added) : v]) };
  return value;
}
