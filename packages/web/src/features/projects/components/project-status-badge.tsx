import type { ProjectStatus } from "@hushmark/schemas";
import { Badge, type BadgeTone } from "../../../components/ui/badge";
import { statusLabels } from "../../../lib/format";

const tones: Record<ProjectStatus, BadgeTone> = {
  brief: "neutral",
  survey: "neutral",
  diagnosis: "caution",
  proposal: "caution",
  approved: "brand",
  in_progress: "brand",
  verified: "good",
  archived: "neutral",
};

export function ProjectStatusBadge({ status }: { status: ProjectStatus }) {
  return <Badge tone={tones[status]}>{statusLabels[status]}</Badge>;
}
