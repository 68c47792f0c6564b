import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { meAs } from "../../../test/fixtures";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { FirmSwitcher } from "./firm-switcher";

afterEach(() => {
  vi.unstubAllGlobals();
});

const otherFirm = { organizationId: "9e8d7c6b-5a49-4382-9716-05f4e3d2c1b0", organizationName: "Brightwater Consulting", role: "planner" as const };

describe("FirmSwitcher", () => {
  it("only names the firm when there is one membership", () => {
    renderWithProviders(<FirmSwitcher me={meAs("owner")} />);
    expect(screen.getByText("Quietline Acoustics")).toBeTruthy();
    expect(screen.queryByLabelText("Firm")).toBeNull();
  });

  it("switches to the chosen firm and leaves the previous firm's page", async () => {
    const switched = { ...meAs("owner", [otherFirm]), membership: otherFirm };
    const { fetchMock, calls } = queueFetch({ status: 200, body: switched });
    vi.stubGlobal("fetch", fetchMock);
    const { router } = renderWithProviders(<FirmSwitcher me={meAs("owner", [otherFirm])} />, { path: "/people", route: "/people" });
    fireEvent.change(screen.getByLabelText("Firm"), { target: { value: otherFirm.organizationId } });
    await waitFor(() => expect(router.state.location.pathname).toBe("/projects"));
    expect(calls[0]?.url).toBe("/api/v1/auth/switch-firm");
    expect(JSON.parse(String(calls[0]?.init?.body))).toEqual({ organizationId: otherFirm.organizationId });
  });
});
