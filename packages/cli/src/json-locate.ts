/**
 * Where a JSON text first goes wrong (character offset), for error messages: a small validating
 * scanner run only after JSON.parse has failed (Node's messages do not always give a position).
 */

const WS = new Set([" ", "\t", "\n", "\r"]);

class Scan {
  i = 0;
  constructor(readonly t: string) {}
  ws(): void {
    while (this.i < this.t.length && WS.has(this.t[this.i]!)) this.i++;
  }
  fail(): never {
    throw this.i;
  }
  expect(ch: string): void {
    if (this.t[this.i] !== ch) this.fail();
    this.i++;
  }
  value(): void {
    this.ws();
    const c = this.t[this.i];
    if (c === "{") return this.object();
    if (c === "[") return this.array();
    if (c === '"') return this.string();
    if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) return this.number();
    for (const word of ["true", "false", "null"]) {
      if (this.t.startsWith(word, this.i)) {
        this.i += word.length;
        return;
      }
    }
    this.fail();
  }
  object(): void {
    this.i++;
    this.ws();
    if (this.t[this.i] === "}") return void this.i++;
    for (;;) {
      this.ws();
      this.string();
      this.ws();
      this.expect(":");
      this.value();
      this.ws();
      if (this.t[this.i] === "}") return void this.i++;
      this.expect(",");
    }
  }
  array(): void {
    this.i++;
    this.ws();
    if (this.t[this.i] === "]") return void this.i++;
    for (;;) {
      this.value();
      this.ws();
      if (this.t[this.i] === "]") return void this.i++;
      this.expect(",");
    }
  }
  string(): void {
    this.expect('"');
    while (this.i < this.t.length) {
      const c = this.t[this.i]!;
      if (c === '"') return void this.i++;
      if (c === "\\") this.i++;
      else if (c < " ") this.fail();
      this.i++;
    }
    this.fail();
  }
  number(): void {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(this.t.slice(this.i));
    if (!m) this.fail();
    this.i += m[0].length;
  }
}

/** Offset of the first syntax error, or undefined when the text is valid JSON. */
export function jsonErrorOffset(text: string): number | undefined {
  const s = new Scan(text);
  try {
    s.value();
    s.ws();
    return s.i < text.length ? s.i : undefined;
  } catch (at) {
    return Math.min(at as number, text.length);
  }
}
