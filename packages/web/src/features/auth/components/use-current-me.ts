import type { Me } from "@hushmark/schemas";
import { useContext } from "react";
import { CurrentMeContext } from "./current-me-context";

/**
 * The signed-in person, for pages behind the sign-in guard. Read from context rather than the
 * query cache so a page never sees "nobody" in the moment between signing out and leaving.
 */
export function useCurrentMe(): Me {
  const me = useContext(CurrentMeContext);
  if (!me) throw new Error("useCurrentMe is only for pages inside the signed-in layout.");
  return me;
}
