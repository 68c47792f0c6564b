import fc from "fast-check";

/** JSON text put in a body as is: numbers JSON.stringify cannot write (1e999 parses as Infinity). */
export class RawJson {
  constructor(readonly text: string) {}
}

/** JSON.stringify that writes RawJson as its text and keeps `__proto__` as an ordinary key. */
export function toJsonText(value: unknown): string {
  if (value instanceof RawJson) return value.text;
  if (value === undefined) return "null";
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  if (Array.isArray(value)) return `[${value.map(toJsonText).join(",")}]`;
  return `{${Object.keys(value)
    .map((k) => `${JSON.stringify(k)}:${toJsonText((value as Record<string, unknown>)[k])}`)
    .join(",")}}`;
}

type Path = (string | number)[];

/** Every path to a value inside `v` (objects and arrays), the root excluded. */
function paths(v: unknown, base: Path = [], out: Path[] = []): Path[] {
  if (v && typeof v === "object" && !(v instanceof RawJson)) {
    for (const [k, child] of Object.entries(v)) {
      const p = [...base, Array.isArray(v) ? Number(k) : k];
      out.push(p);
      if (out.length < 400) paths(child, p, out);
    }
  }
  return out;
}

function clone<T>(v: T): T {
  return v === undefined ? v : (structuredClone(v) as T);
}

/** A copy of `root` with the value at `path` replaced (or removed when `replacement` is `REMOVE`). */
const REMOVE = Symbol("remove");
function setAt(root: unknown, path: Path, replacement: unknown): unknown {
  if (path.length === 0) return replacement === REMOVE ? {} : replacement;
  const copy = clone(root) as Record<string | number, unknown>;
  let cursor = copy;
  for (const key of path.slice(0, -1)) cursor = cursor[key] as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  if (replacement === REMOVE) {
    if (Array.isArray(cursor)) cursor.splice(Number(last), 1);
    else delete cursor[last];
  } else cursor[last] = replacement;
  return copy;
}

const hostileString = fc.oneof(
  fc.constant("x".repeat(100_000)),
  fc.constant("ä".repeat(70_000)),
  fc.constant("\u0000"),
  fc.constant("a\u0000b"),
  fc.constant("\ud800"),
  fc.constant("\u202e\u0645\u0631\u062d\u0628\u0627"),
  fc.constant("👩‍👩‍👧‍👦".repeat(50)),
  fc.constant("   "),
  fc.constant(""),
  fc.constant("'; DROP TABLE projects; --"),
  fc.constant("<script>alert(1)</script>"),
  fc.constant("../../etc/passwd"),
  fc.string({ unit: "binary", maxLength: 60 }),
);

const hostileNumber = fc.oneof(
  fc.constantFrom("1e999", "-1e999", "1e-400", "-0", "9007199254740993", "1e308", "0.1e-320", "123456789012345678901234567890").map((t) => new RawJson(t)),
  fc.constantFrom(Number.MAX_SAFE_INTEGER, Number.MIN_SAFE_INTEGER, -1, 0, 2 ** 31, -(2 ** 31), 1.5, 1e21),
);

const deepNesting = fc.integer({ min: 50, max: 3000 }).chain((depth) => fc.constantFrom(new RawJson(`${"[".repeat(depth)}${"]".repeat(depth)}`), new RawJson(`${'{"a":'.repeat(depth)}1${"}".repeat(depth)}`)));

const wrongType = fc.oneof(fc.constant(null), fc.constant(true), fc.constant([]), fc.constant({}), fc.constant("12"), fc.constant(12), fc.constant([1, "2", null]), hostileNumber, hostileString);

const protoKeys = fc.constantFrom(
  new RawJson('{"__proto__":{"admin":true,"role":"owner"}}'),
  new RawJson('{"constructor":{"prototype":{"polluted":true}}}'),
);

/** One way of spoiling a valid body. */
export type Mutation = { kind: string; apply: (body: unknown) => unknown };

/** Mutations of a valid body: each answers a new body (the input is not changed). */
export function mutationOf(valid: unknown): fc.Arbitrary<Mutation> {
  const all = paths(valid);
  const path = all.length ? fc.constantFrom(...all) : fc.constant([] as Path);
  return fc.oneof(
    path.map((p) => ({ kind: `drop ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, REMOVE) })),
    fc.tuple(path, wrongType).map(([p, v]) => ({ kind: `wrong type at ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, v) })),
    fc.tuple(path, hostileString).map(([p, v]) => ({ kind: `string at ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, v) })),
    fc.tuple(path, hostileNumber).map(([p, v]) => ({ kind: `number at ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, v) })),
    fc.tuple(path, deepNesting).map(([p, v]) => ({ kind: `deep at ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, v) })),
    fc.tuple(fc.stringMatching(/^[a-zA-Z$_]{1,12}$/), fc.jsonValue({ maxDepth: 2 })).map(([k, v]) => ({
      kind: `extra key ${k}`,
      apply: (b: unknown) => (b && typeof b === "object" && !Array.isArray(b) ? { ...b, [k]: v } : { [k]: v }),
    })),
    fc.tuple(path, protoKeys).map(([p, v]) => ({ kind: `prototype keys at ${p.join(".")}`, apply: (b: unknown) => setAt(b, p, v) })),
    fc.constant({ kind: "prototype keys at the root", apply: (b: unknown) => new RawJson(`{"__proto__":{"isAdmin":true},${toJsonText(b).slice(1)}`) }),
    fc.constantFrom<Mutation>(
      { kind: "whole body an array", apply: (b) => [b] },
      { kind: "whole body a string", apply: () => "body" },
      { kind: "whole body null", apply: () => null },
      { kind: "whole body NaN", apply: () => new RawJson("NaN") },
      { kind: "whole body truncated", apply: (b) => new RawJson(toJsonText(b).slice(0, -1)) },
    ),
  );
}

/** Line- and cell-level damage to CSV text: what a spreadsheet export or a hand edit does to a file. */
export function csvMutationOf(text: string): fc.Arbitrary<{ kind: string; text: string }> {
  const lines = text.split("\n");
  const line = fc.integer({ min: 0, max: Math.max(0, lines.length - 1) });
  const edit = (k: number, f: (l: string) => string) => lines.map((l, i) => (i === k ? f(l) : l)).join("\n");
  const cell = fc.oneof(hostileString.filter((s) => s.length < 1000), fc.constantFrom("NaN", "Infinity", "-Infinity", "1e999", "-0", "0x10", "1,5", "1.2.3", '"', '"a""b"', "=cmd|' /C calc'!A0", "", " ", "null"));
  return fc.oneof(
    line.map((k) => ({ kind: `line ${k} dropped`, text: lines.filter((_, i) => i !== k).join("\n") })),
    fc.tuple(line, cell).map(([k, c]) => ({ kind: `line ${k} last cell replaced`, text: edit(k, (l) => l.replace(/[^,;\t]*$/, c)) })),
    fc.tuple(line, cell).map(([k, c]) => ({ kind: `cell added to line ${k}`, text: edit(k, (l) => `${l},${c}`) })),
    line.map((k) => ({ kind: `line ${k} duplicated`, text: [...lines.slice(0, k + 1), lines[k] ?? "", ...lines.slice(k + 1)].join("\n") })),
    line.map((k) => ({ kind: `line ${k} cut short`, text: edit(k, (l) => l.slice(0, Math.floor(l.length / 2))) })),
    fc.constantFrom(",", ";", "\t", "|").map((sep) => ({ kind: `separator ${JSON.stringify(sep)}`, text: text.replace(/[,;\t]/g, sep) })),
    fc.constant({ kind: "CRLF and a BOM", text: `\uFEFF${text.replace(/\n/g, "\r\n")}` }),
    fc.constant({ kind: "an unclosed quote", text: text.replace(/\n/, '\n"') }),
    fc.constant({ kind: "header only", text: lines[0] ?? "" }),
    fc.constant({ kind: "no header", text: lines.slice(1).join("\n") }),
    fc.integer({ min: 100, max: 4000 }).map((n) => ({ kind: `${n} extra rows`, text: `${text}\n${(lines[lines.length - 1] ?? "").concat("\n").repeat(n)}` })),
    fc.constant({ kind: "only commas", text: ",,,,\n,,,,\n" }),
    hostileString.map((s) => ({ kind: "hostile text", text: s })),
  );
}
