import { describe, expect, it } from "vitest";
import { paths, safeNextPath } from "./paths";

describe("safeNextPath", () => {
  it("keeps a path on this site", () => {
    expect(safeNextPath("/projects/abc/sketch?x=1")).toBe("/projects/abc/sketch?x=1");
  });

  it("refuses other origins and protocol-relative tricks", () => {
    for (const next of ["https://elsewhere.example/", "//elsewhere.example", "/\\elsewhere.example", "javascript:alert(1)", "", null]) {
      expect(safeNextPath(next)).toBe(paths.projects);
    }
  });

  it("does not send a person back to the sign-in page itself", () => {
    expect(safeNextPath("/sign-in?next=/people")).toBe(paths.projects);
  });
});
