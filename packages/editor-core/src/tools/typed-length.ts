import type { KeyInput } from "./tool.js";
import { isLengthKey } from "../units/length.js";

/** The digits a surveyor types while drawing; Enter hands the text to the tool. */
export class TypedBuffer {
  text = "";

  /** Answers "typed" (text changed), "enter" (apply it), or null (not a length key). */
  key(k: KeyInput): "typed" | "enter" | null {
    if (k.mod) return null;
    if (k.key === "Enter") return this.text ? "enter" : null;
    if (k.key === "Backspace" && this.text) { this.text = this.text.slice(0, -1); return "typed"; }
    if (isLengthKey(k.key) && (this.text || k.key !== " ")) { this.text += k.key; return "typed"; }
    return null;
  }

  clear(): void { this.text = ""; }
}
