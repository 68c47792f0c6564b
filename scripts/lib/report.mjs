// Reads the vitest JSON reports every package wrote and sums them into one line.
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

/** Answers `{ name, passed, failed, skipped, failures: [title] }` for one report file, or null. */
export function readReport(file, name) {
  if (!existsSync(file)) return null;
  const report = JSON.parse(readFileSync(file, "utf8"));
  const failures = [];
  for (const suite of report.testResults ?? []) {
    for (const test of suite.assertionResults ?? []) if (test.status === "failed") failures.push(`${name}: ${test.fullName}`);
    if (suite.status === "failed" && !(suite.assertionResults ?? []).some((t) => t.status === "failed")) {
      failures.push(`${name}: ${suite.name} (the file failed to run: ${String(suite.message ?? "").split("\n")[0]})`);
    }
  }
  const fileErrors = failures.length - (report.numFailedTests ?? 0);
  return {
    name,
    passed: report.numPassedTests ?? 0,
    failed: (report.numFailedTests ?? 0) + Math.max(0, fileErrors),
    skipped: (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0),
    failures,
  };
}

/** Reads `<pkg>/.vitest-report.json` for every package folder. */
export function readPackageReports(root, packages) {
  return packages.map((pkg) => readReport(join(root, "packages", pkg, ".vitest-report.json"), pkg));
}
