import type { Me, Role } from "@hushmark/schemas";

// An invented firm for the tests; ids are fixed so answers can refer to each other.
export const firmId = "6a1d2c3b-7e4f-4a5b-8c9d-0e1f2a3b4c5d";

export function meAs(role: Role, extraFirms: Array<{ organizationId: string; organizationName: string; role: Role }> = []): Me {
  const membership = { organizationId: firmId, organizationName: "Quietline Acoustics", role };
  return {
    user: { id: "0b5f6f2e-4a1e-4c47-9d43-2f1f3c1a7a01", email: `${role}@quietline.example`, displayName: "Wren Adair" },
    membership,
    memberships: [membership, ...extraFirms],
  };
}

export const notSignedIn = { status: 401, body: { error: { code: "not_signed_in", message: "Please sign in." } } };
