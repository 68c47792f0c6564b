import fc from "fast-check";
import type { z } from "zod";

/**
 * A fast-check arbitrary of values a zod schema should accept, for the schema kinds the shared
 * schemas use (objects, strings with length/format checks, numbers with bounds, enums, literals,
 * unions, arrays, optional/nullable/default, pipes). Refinements are not modelled, so a caller
 * that needs strictly valid values filters with `safeParse`; the mutations want near-valid ones.
 */
export function arbitraryOf(schema: z.ZodType): fc.Arbitrary<unknown> {
  return build(schema as unknown as Node);
}

interface Check {
  _zod: { def: { check: string; minimum?: number | bigint; maximum?: number | bigint; value?: number | bigint; length?: number; inclusive?: boolean; format?: string; pattern?: RegExp } };
}
interface Def {
  type: string;
  checks?: Check[];
  format?: string;
  pattern?: RegExp;
  shape?: Record<string, Node>;
  element?: Node;
  innerType?: Node;
  options?: Node[];
  entries?: Record<string, string | number>;
  values?: unknown[];
  in?: Node;
  out?: Node;
  keyType?: Node;
  valueType?: Node;
}
interface Node {
  _zod: { def: Def; bag?: { minimum?: number; maximum?: number; minLength?: number; maxLength?: number; length?: number; pattern?: RegExp; format?: string } };
}

function bounds(def: Def) {
  let min: number | undefined;
  let max: number | undefined;
  let exclusiveMin = false;
  let exclusiveMax = false;
  let minLength: number | undefined;
  let maxLength: number | undefined;
  let int = false;
  let pattern: RegExp | undefined = def.pattern;
  let format = def.format;
  for (const c of def.checks ?? []) {
    const d = c._zod.def;
    if (d.check === "greater_than") {
      min = Number(d.value);
      exclusiveMin = d.inclusive === false;
    } else if (d.check === "less_than") {
      max = Number(d.value);
      exclusiveMax = d.inclusive === false;
    } else if (d.check === "min_length") minLength = d.minimum as number;
    else if (d.check === "max_length") maxLength = d.maximum as number;
    else if (d.check === "length_equals") minLength = maxLength = d.length;
    else if (d.check === "number_format") int = true;
    else if (d.check === "string_format") {
      format = d.format;
      if (d.pattern) pattern = d.pattern;
    }
  }
  if (def.format === "safeint") int = true;
  return { min, max, exclusiveMin, exclusiveMax, minLength, maxLength, int, pattern, format };
}

const isoDateTime = fc.date({ min: new Date("2000-01-01T00:00:00Z"), max: new Date("2099-12-31T00:00:00Z"), noInvalidDate: true }).map((d) => d.toISOString());

function stringArb(def: Def): fc.Arbitrary<string> {
  const b = bounds(def);
  if (b.format === "uuid") return fc.uuid({ version: 4 });
  if (b.format === "email") return fc.tuple(fc.stringMatching(/^[a-z][a-z0-9]{0,10}$/), fc.constantFrom("example.com", "test.example", "firm.example")).map(([l, d]) => `${l}@${d}`);
  if (b.format === "datetime") return isoDateTime;
  if (b.format === "date") return isoDateTime.map((s) => s.slice(0, 10));
  if (b.pattern) return fc.stringMatching(b.pattern);
  const minLength = b.minLength ?? 0;
  const maxLength = Math.min(b.maxLength ?? 40, Math.max(minLength, 40));
  // Letters and spaces stay valid after a `.trim()` when they start and end with a letter.
  return fc.string({ minLength: Math.max(minLength, 1), maxLength: Math.max(maxLength, 1), unit: fc.constantFrom(..."abcdefghijklmnopqrstuvwxyzÄéø") });
}

function numberArb(def: Def): fc.Arbitrary<number> {
  const b = bounds(def);
  if (b.int) {
    const min = b.min === undefined ? -1000 : Math.ceil(b.exclusiveMin ? b.min + 1 : b.min);
    const max = b.max === undefined ? Math.max(min, 0) + 1000 : Math.floor(b.exclusiveMax ? b.max - 1 : b.max);
    return fc.integer({ min, max });
  }
  const min = b.min ?? (b.max !== undefined ? b.max - 1000 : -1000);
  const max = b.max ?? min + 1000;
  return fc.double({ min, max, noNaN: true, noDefaultInfinity: true, minExcluded: b.exclusiveMin, maxExcluded: b.exclusiveMax }).map((x) => (Object.is(x, -0) ? 0 : x));
}

function build(node: Node): fc.Arbitrary<unknown> {
  const def = node._zod.def;
  switch (def.type) {
    case "string":
      return stringArb(def);
    case "number":
      return numberArb(def);
    case "boolean":
      return fc.boolean();
    case "literal":
      return fc.constantFrom(...(def.values ?? []));
    case "enum":
      return fc.constantFrom(...Object.values(def.entries ?? {}));
    case "optional":
      return fc.option(build(def.innerType!), { nil: undefined, freq: 3 });
    case "nullable":
      return fc.option(build(def.innerType!), { nil: null, freq: 3 });
    case "default":
    case "prefault":
      return fc.option(build(def.innerType!), { nil: undefined, freq: 2 });
    case "pipe":
      // A transform's input is what the client sends.
      return build(def.in!._zod.def.type === "transform" ? def.out! : def.in!);
    case "union":
      return fc.oneof(...def.options!.map(build));
    case "array": {
      const b = bounds(def);
      const minLength = b.minLength ?? 0;
      return fc.array(build(def.element!), { minLength, maxLength: Math.min(b.maxLength ?? 4, Math.max(minLength, 4)) });
    }
    case "object": {
      const shape = def.shape!;
      const keys = Object.keys(shape);
      return fc.record(Object.fromEntries(keys.map((k) => [k, build(shape[k]!)]))).map((o) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)));
    }
    case "record":
      return fc.dictionary(fc.stringMatching(/^[a-z]{1,8}$/), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 4 });
    case "unknown":
    case "any":
      return fc.jsonValue({ maxDepth: 2 });
    case "coerce":
      return build(def.innerType!);
    default:
      throw new Error(`no arbitrary for zod type ${def.type}`);
  }
}
