import type { Member } from "@hushmark/schemas";
import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch, renderWithProviders } from "../../../test/render";
import { MembersList } from "./members-list";

afterEach(() => {
  vi.unstubAllGlobals();
});

const me: Member = { membershipId: "a0000000-0000-4000-8000-000000000001", userId: "b0000000-0000-4000-8000-000000000001", email: "wren@quietline.example", displayName: "Wren Adair", role: "owner", joinedAt: "2026-11-01T09:00:00.000Z" };
const sam: Member = { membershipId: "a0000000-0000-4000-8000-000000000002", userId: "b0000000-0000-4000-8000-000000000002", email: "sam@quietline.example", displayName: "Sam Okafor", role: "surveyor", joinedAt: "2026-11-02T09:00:00.000Z" };

describe("MembersList", () => {
  it("lets the owner change someone else's role but not their own", async () => {
    const { fetchMock, calls } = queueFetch({ status: 200, body: { ...sam, role: "planner" } });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<MembersList members={[me, sam]} myUserId={me.userId} />);
    expect(screen.queryByLabelText("Access for Wren Adair")).toBeNull();
    fireEvent.change(screen.getByLabelText("Access for Sam Okafor"), { target: { value: "planner" } });
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]?.url).toBe(`/api/v1/people/members/${sam.membershipId}`);
    expect(calls[0]?.init?.method).toBe("PATCH");
    expect(JSON.parse(String(calls[0]?.init?.body))).toEqual({ role: "planner" });
  });

  it("asks before removing someone, and only then calls the server", async () => {
    const { fetchMock, calls } = queueFetch({ status: 204 });
    vi.stubGlobal("fetch", fetchMock);
    renderWithProviders(<MembersList members={[me, sam]} myUserId={me.userId} />);
    fireEvent.click(screen.getByRole("button", { name: "Remove Sam Okafor" }));
    expect(calls).toHaveLength(0);
    fireEvent.click(screen.getByRole("button", { name: "Keep" }));
    expect(screen.queryByRole("button", { name: "Yes, remove" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Remove Sam Okafor" }));
    fireEvent.click(screen.getByRole("button", { name: "Yes, remove" }));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]?.init?.method).toBe("DELETE");
    expect(calls[0]?.url).toBe(`/api/v1/people/members/${sam.membershipId}`);
  });
});
