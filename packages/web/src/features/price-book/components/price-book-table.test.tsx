import { screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { PriceBookItem } from "@hushmark/schemas";
import { renderWithProviders } from "../../../test/render";
import { PriceBookTable } from "./price-book-table";

// Invented demo prices.
const seal: PriceBookItem = {
  id: "0b9c2f7e-1d2a-4c3b-9e8f-7a6b5c4d3e2f", updatedAt: "2026-11-30T10:00:00.000Z", code: "door-seal-kit", name: "Door perimeter seal kit", family: "sealing",
  appliesTo: ["door"], effect: { kind: "sealed-gap", gap: "perimeter", remainingOpenAreaM2: 0 },
  costs: { fixedMaterials: 0, fixedLabour: 0, perM2Materials: 0, perM2Labour: 0, perItemMaterials: 85, perItemLabour: 60 },
  labourHours: 1.5, addedThicknessMm: 0, flags: [], cautions: [], active: true,
};

/** The screen as wide as a phone (or not): the table's media query answers `narrow`. */
function screenWidth(narrow: boolean) {
  vi.stubGlobal("matchMedia", (query: string) => ({ matches: narrow && query.includes("max-width"), media: query, addEventListener: () => undefined, removeEventListener: () => undefined }));
}

describe("the price book on a phone", () => {
  afterEach(() => vi.unstubAllGlobals());

  it("shows one card per upgrade instead of the wide table, with only the costs that apply for a reader", () => {
    screenWidth(true);
    renderWithProviders(<PriceBookTable items={[seal]} currency="USD" editable={false} />);
    expect(screen.queryByRole("table")).toBeNull();
    const card = within(screen.getByRole("list", { name: "Upgrades" })).getByRole("listitem");
    expect(within(card).getByText("Door perimeter seal kit")).toBeTruthy();
    expect(within(card).getByText("Materials / item")).toBeTruthy();
    expect(within(card).getByText("85")).toBeTruthy();
    expect(within(card).queryByText("Fixed materials")).toBeNull();
    expect(screen.getByLabelText("Order by")).toBeTruthy();
  });

  it("keeps every cost in the card for an owner, who can set one that is zero", () => {
    screenWidth(true);
    renderWithProviders(<PriceBookTable items={[seal]} currency="USD" editable />);
    expect(within(screen.getByRole("listitem")).getByText("Fixed materials")).toBeTruthy();
  });

  it("keeps the table on a wide screen", () => {
    screenWidth(false);
    renderWithProviders(<PriceBookTable items={[seal]} currency="USD" editable={false} />);
    expect(screen.getByRole("table")).toBeTruthy();
    expect(screen.queryByRole("list", { name: "Upgrades" })).toBeNull();
  });
});
