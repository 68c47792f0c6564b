import * as webIfc from "web-ifc";
import { describe, expect, it } from "vitest";
import { IFC_CODES } from "./ifc-codes.js";

describe("IFC_CODES", () => {
  it("match the installed web-ifc's type codes", () => {
    for (const [name, code] of Object.entries(IFC_CODES)) expect([name, (webIfc as unknown as Record<string, number>)[name]]).toEqual([name, code]);
  });
});
