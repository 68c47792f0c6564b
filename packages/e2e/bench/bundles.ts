import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";

const kb = (n: number) => Math.round((n / 1024) * 10) / 10;

/** Gzip sizes of the built web app per route: the entry's scripts, then what each lazy section adds. */
export function bundleRows(distDir: string): Array<{ route: string; chunks: string; gzip_kB: number }> {
  const assets = join(distDir, "assets");
  const files = readdirSync(assets).filter((f) => f.endsWith(".js"));
  const size = new Map(files.map((f) => [f, gzipSync(readFileSync(join(assets, f))).length]));
  const imports = (f: string): string[] => [...readFileSync(join(assets, f), "utf8").matchAll(/(?:from|import)\s*"\.\/([^"]+\.js)"/g)].map((m) => m[1]!);
  const closure = (start: string[]): Set<string> => {
    const seen = new Set<string>();
    const todo = [...start];
    while (todo.length) {
      const f = todo.pop()!;
      if (seen.has(f) || !size.has(f)) continue;
      seen.add(f);
      todo.push(...imports(f));
    }
    return seen;
  };
  const html = readFileSync(join(distDir, "index.html"), "utf8");
  const entry = closure([...html.matchAll(/assets\/([^"]+\.js)/g)].map((m) => m[1]!));
  const sum = (set: Iterable<string>) => [...set].reduce((s, f) => s + (size.get(f) ?? 0), 0);
  const rows = [{ route: "every page (entry)", chunks: [...entry].map((f) => f.replace(/-[\w-]{8}\.js$/, "")).join(", "), gzip_kB: kb(sum(entry)) }];
  for (const lazy of files.filter((f) => /-section-/.test(f))) {
    const extra = [...closure([lazy])].filter((f) => !entry.has(f));
    rows.push({ route: `+ ${lazy.replace(/-[\w-]{8}\.js$/, "")}`, chunks: extra.map((f) => f.replace(/-[\w-]{8}\.js$/, "")).join(", "), gzip_kB: kb(sum(extra)) });
  }
  return rows;
}
