import type { Me } from "@hushmark/schemas";
import { createContext } from "react";

/** The signed-in person, provided by the signed-in layout once the session check has answered. */
export const CurrentMeContext = createContext<Me | null>(null);
