import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from "react";
import { useParams } from "react-router-dom";
import { EmptyState } from "../../components/ui/empty-state";
import { useCurrentMe } from "../../features/auth/components/use-current-me";
import { PlanSummary } from "../../features/projects/components/plan-summary";
import { SectionPlaceholder } from "../../features/projects/components/section-placeholder";
import type { ProjectSection } from "../../features/projects/components/sections";
import { can } from "../../lib/permissions";
import { PageLoading } from "../../components/ui/spinner";

const SketchSection = lazy(() => import("../../features/editor/sketch-section"));
const PathsSection = lazy(() => import("../../features/paths/paths-section"));
const BriefSection = lazy(() => import("../../features/intake/brief-section"));
const MeasureSection = lazy(() => import("../../features/measurements/measure-section"));
const moneySections: Record<string, LazyExoticComponent<ComponentType<{ projectId: string }>>> = {
  options: lazy(() => import("../../features/scenarios/options-section")),
  proposal: lazy(() => import("../../features/proposals/proposal-section")),
  jobs: lazy(() => import("../../features/jobs/jobs-section")),
  verify: lazy(() => import("../../features/verify/verify-section")),
};

export function ProjectSectionRoute({ section }: { section: ProjectSection }) {
  const { projectId = "" } = useParams();
  const me = useCurrentMe();
  // The plan itself starts loading in the signed-in layout (useEarlyPlan), beside the session check.

  if (!section.clientVisible && !can.seeAllSections(me.membership.role)) {
    return <EmptyState title={`${section.label} is for the firm's team`}>Your contractor shares the plan, the sound paths, the proposal and the verification with you.</EmptyState>;
  }

  if (section.slug === "sketch") {
    return (
      <Suspense fallback={<PageLoading label="Opening the plan" />}>
        <SketchSection projectId={projectId} />
      </Suspense>
    );
  }

  if (section.slug === "brief" || section.slug === "measure") {
    const Screen = section.slug === "brief" ? BriefSection : MeasureSection;
    return (
      <Suspense fallback={<PageLoading label={`Opening ${section.label}`} />}>
        <Screen projectId={projectId} />
      </Suspense>
    );
  }

  if (section.slug === "paths") {
    return (
      <Suspense fallback={<PageLoading label="Opening the plan" />}>
        <PathsSection projectId={projectId} />
      </Suspense>
    );
  }

  const MoneyScreen = moneySections[section.slug];
  if (MoneyScreen) {
    return (
      <Suspense fallback={<PageLoading label={`Opening ${section.label}`} />}>
        <MoneyScreen projectId={projectId} />
      </Suspense>
    );
  }

  return <SectionPlaceholder section={section}>{section.slug === "sketch" ? <PlanSummary projectId={projectId} /> : null}</SectionPlaceholder>;
}
