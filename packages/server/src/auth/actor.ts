import type { Role } from "@hushmark/schemas";

/** The signed-in caller as every service sees it. */
export interface Actor {
  userId: string;
  email: string;
  displayName: string;
  membershipId: string;
  organizationId: string;
  organizationName: string;
  role: Role;
  sessionId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      actor?: Actor;
    }
  }
}
