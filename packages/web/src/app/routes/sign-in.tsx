import { useNavigate, useSearchParams } from "react-router-dom";
import { toast } from "sonner";
import { paths, safeNextPath } from "../../config/paths";
import { SignInForm } from "../../features/auth/components/sign-in-form";
import { AuthCard, AuthLink } from "../layouts/auth-layout";

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get("next");
  const returning = safeNextPath(next) !== paths.projects;
  return (
    <AuthCard
      title="Sign in"
      description={returning ? "Sign in to continue where you were." : "Welcome back to Hushmark."}
      footer={
        <>
          <AuthLink to={paths.forgotPassword}>Forgot your password?</AuthLink>
          <p className="text-muted">
            New firm? <AuthLink to={paths.signUp}>Create one</AuthLink>
          </p>
        </>
      }
    >
      <SignInForm
        onSignedIn={(me) => {
          toast.success(`Signed in as ${me.user.displayName}.`);
          navigate(safeNextPath(next), { replace: true });
        }}
      />
    </AuthCard>
  );
}
