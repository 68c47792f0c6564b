import { useNavigate } from "react-router-dom";
import { toast } from "sonner";
import { paths } from "../../config/paths";
import { SignUpForm } from "../../features/auth/components/sign-up-form";
import { AuthCard, AuthLink } from "../layouts/auth-layout";

export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <AuthCard
      title="Create your firm"
      description="You become its owner and can invite your surveyors, planners and clients next."
      footer={
        <p className="text-muted">
          Already on Hushmark? <AuthLink to={paths.signIn}>Sign in</AuthLink>
        </p>
      }
    >
      <SignUpForm
        onSignedUp={(me) => {
          toast.success(`${me.membership.organizationName} is ready.`);
          navigate(paths.projects, { replace: true });
        }}
      />
    </AuthCard>
  );
}
