import { Link } from 'react-router-dom';
import { AuthLayout } from '../../components/layout/auth-layout';
import { paths } from '../../config/paths';
import { usePublicConfig } from '../../features/auth/api/get-public-config';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { useDocumentTitle } from '../use-document-title';

export function ForgotPasswordRoute() {
  useDocumentTitle('Forgot password');
  const config = usePublicConfig();
  return (
    <AuthLayout title="Forgot your password?" lead="Give the e-mail address you sign in with. We send a link to set a new password.">
      <ForgotPasswordForm demoMode={config.data?.demoMode ?? false} />
      <p className="mt-5 text-sm">
        <Link to={paths.signIn} className="font-medium text-brand underline underline-offset-2">
          Back to sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
