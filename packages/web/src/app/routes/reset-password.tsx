import { useNavigate, useParams } from "react-router-dom";
import { toast } from "sonner";
import { paths } from "../../config/paths";
import { ResetPasswordForm } from "../../features/auth/components/reset-password-form";
import { AuthCard, AuthLink } from "../layouts/auth-layout";

export function ResetPasswordRoute() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  return (
    <AuthCard
      title="Choose a new password"
      description="Saving it signs you out everywhere else."
      footer={<AuthLink to={paths.forgotPassword}>Ask for a new link</AuthLink>}
    >
      <ResetPasswordForm
        token={token}
        onReset={() => {
          toast.success("Password changed. Sign in with the new one.");
          navigate(paths.signIn, { replace: true });
        }}
      />
    </AuthCard>
  );
}
