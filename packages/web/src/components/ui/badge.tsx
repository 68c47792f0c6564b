import type { ReactNode } from "react";

export type BadgeTone = "neutral" | "brand" | "good" | "caution" | "danger";

const tones: Record<BadgeTone, string> = {
  neutral: "border-rule bg-paper text-ink",
  brand: "border-brand/30 bg-brand-soft text-brand-strong",
  good: "border-good/30 bg-good/10 text-good",
  caution: "border-caution/40 bg-caution/10 text-[#8a5f0c]",
  danger: "border-danger/30 bg-danger/10 text-danger",
};

export function Badge({ tone = "neutral", children }: { tone?: BadgeTone; children: ReactNode }) {
  return <span className={`inline-flex items-center whitespace-nowrap rounded-full border px-2.5 py-0.5 text-[13px] font-medium ${tones[tone]}`}>{children}</span>;
}
