import type { ProposalStatus } from "@hushmark/schemas";
import type { BadgeTone } from "../../../components/ui/badge";

export const statusWords: Record<ProposalStatus, { label: string; tone: BadgeTone }> = {
  draft: { label: "Draft", tone: "neutral" },
  sent: { label: "Sent", tone: "brand" },
  changes_asked: { label: "Changes asked", tone: "caution" },
  approved: { label: "Approved", tone: "good" },
  deposit_paid: { label: "Deposit paid", tone: "good" },
  in_progress: { label: "In progress", tone: "brand" },
  verified: { label: "Verified", tone: "good" },
};

export const STATUS_ORDER: ProposalStatus[] = ["draft", "sent", "approved", "deposit_paid", "in_progress", "verified"];
