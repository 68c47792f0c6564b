import { paths } from "../../config/paths";
import { ForgotPasswordForm } from "../../features/auth/components/forgot-password-form";
import { AuthCard, AuthLink } from "../layouts/auth-layout";

export function ForgotPasswordRoute() {
  return (
    <AuthCard
      title="Reset your password"
      description="Enter the e-mail you sign in with and we will send a link to choose a new password."
      footer={<AuthLink to={paths.signIn}>Back to sign in</AuthLink>}
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
