/**
 * Stripe's request bodies are form-encoded with bracketed keys (`line_items[0][price_data][currency]=usd`).
 * This turns them into nested objects, with numeric keys as arrays, like the hosted API reads them.
 */
export type FormValue = string | FormValue[] | { [key: string]: FormValue };

function keyPath(raw: string): string[] {
  const first = raw.indexOf("[");
  if (first < 0) return [raw];
  const head = raw.slice(0, first);
  const rest = [...raw.slice(first).matchAll(/\[([^\]]*)\]/g)].map((m) => m[1] ?? "");
  return [head, ...rest];
}

function toArrays(value: FormValue): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const converted = Object.fromEntries(keys.map((k) => [k, toArrays(value[k] as FormValue)]));
  if (keys.length > 0 && keys.every((k) => /^\d+$/.test(k))) {
    return keys.sort((a, b) => Number(a) - Number(b)).map((k) => converted[k] as FormValue);
  }
  return converted;
}

/** Parses `application/x-www-form-urlencoded` text with bracketed keys into nested values. */
export function parseStripeForm(text: string): Record<string, FormValue> {
  const root: Record<string, FormValue> = {};
  for (const [rawKey, value] of new URLSearchParams(text)) {
    const path = keyPath(rawKey);
    let node: Record<string, FormValue> = root;
    path.forEach((segment, i) => {
      const key = segment === "" ? String(Object.keys(node).length) : segment;
      if (i === path.length - 1) node[key] = value;
      else {
        const next = node[key];
        if (typeof next !== "object" || Array.isArray(next)) node[key] = {};
        node = node[key] as Record<string, FormValue>;
      }
    });
  }
  return toArrays(root) as Record<string, FormValue>;
}

/** A string field of a parsed form, or undefined. */
export function formString(value: FormValue | undefined): string | undefined {
  return typeof value === "string" ? value : undefined;
}

/** A flat string map (metadata), dropping anything nested. */
export function formStringMap(value: FormValue | undefined): Record<string, string> {
  if (!value || typeof value !== "object" || Array.isArray(value)) return {};
  return Object.fromEntries(Object.entries(value).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : [])));
}
