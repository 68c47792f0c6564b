import { fireEvent, render, screen, waitFor } from "@testing-library/react";
import { priceBookItemInputSchema } from "@hushmark/schemas";
import { describe, expect, it, vi } from "vitest";
import type { z } from "zod";
import { EditableCell } from "./editable-cell";

const labour = priceBookItemInputSchema.shape.labourHours as unknown as z.ZodType<number>;

describe("a price book cell edited in place", () => {
  it("refuses a value the schema refuses, with its message, and sends nothing", async () => {
    const onSave = vi.fn(async () => {});
    render(<EditableCell value={6} schema={labour} parse={Number} format={String} label="Labour hours of Lining" editable onSave={onSave} />);
    fireEvent.click(screen.getByRole("button", { name: /Labour hours of Lining: 6/ }));
    const input = screen.getByLabelText("Labour hours of Lining");
    fireEvent.change(input, { target: { value: "-3" } });
    fireEvent.keyDown(input, { key: "Enter" });
    expect((await screen.findByRole("alert")).textContent).toBe("Labour cannot be negative.");
    expect(onSave).not.toHaveBeenCalled();
  });

  it("saves a valid value on Enter and puts the old one back on Escape", async () => {
    const onSave = vi.fn(async (_v: number) => {});
    const { rerender } = render(<EditableCell value={6} schema={labour} parse={Number} format={String} label="Labour hours" editable onSave={onSave} />);
    fireEvent.click(screen.getByRole("button", { name: /Labour hours: 6/ }));
    fireEvent.change(screen.getByLabelText("Labour hours"), { target: { value: "7.5" } });
    fireEvent.keyDown(screen.getByLabelText("Labour hours"), { key: "Enter" });
    await waitFor(() => expect(onSave).toHaveBeenCalledWith(7.5));
    rerender(<EditableCell value={7.5} schema={labour} parse={Number} format={String} label="Labour hours" editable onSave={onSave} />);
    fireEvent.click(await screen.findByRole("button", { name: /Labour hours: 7.5/ }));
    fireEvent.change(screen.getByLabelText("Labour hours"), { target: { value: "99" } });
    fireEvent.keyDown(screen.getByLabelText("Labour hours"), { key: "Escape" });
    expect(screen.getByRole("button", { name: /Labour hours: 7.5/ })).toBeTruthy();
    expect(onSave).toHaveBeenCalledTimes(1);
  });

  it("is plain text for a role that may not edit", () => {
    render(<EditableCell value={6} schema={labour} parse={Number} format={String} label="Labour hours" editable={false} onSave={async () => {}} />);
    expect(screen.queryByRole("button")).toBeNull();
    expect(screen.getByText("6")).toBeTruthy();
  });
});
