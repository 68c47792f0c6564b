/** One thing wrong with, or assumed about, a plan, worded for the surveyor. */
export interface Problem {
  code: string;
  severity: "error" | "warning";
  /** The plan element concerned; "" for the document as a whole. */
  elementId: string;
  message: string;
  suggestion: string;
}
