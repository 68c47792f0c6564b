import { useQuery } from "@tanstack/react-query";
import { Navigate, useParams, useSearchParams } from "react-router-dom";
import { ErrorState } from "../../components/ui/error-state";
import { PageLoading } from "../../components/ui/spinner";
import { paths } from "../../config/paths";
import { proposalQueryOptions } from "../proposals/api/proposals";

/** The link in the proposal e-mail: finds the proposal's project and opens its Proposal section. */
export default function PortalRoute() {
  const { proposalId = "" } = useParams();
  const [params] = useSearchParams();
  const proposal = useQuery(proposalQueryOptions(proposalId));
  if (proposal.isPending) return <PageLoading label="Opening your proposal" />;
  if (proposal.isError) return <ErrorState title="This proposal is not available to you" error={proposal.error} />;
  const next = new URLSearchParams({ id: proposal.data.id });
  const payment = params.get("payment");
  if (payment) next.set("payment", payment);
  return <Navigate to={`${paths.projectSection(proposal.data.projectId, "proposal")}?${next.toString()}`} replace />;
}
