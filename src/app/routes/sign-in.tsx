import { useState } from 'react';
import type { SignInInput } from '../../../shared/schemas/auth';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layout/auth-layout';
import { paths, safeNextPath } from '../../config/paths';
import { usePublicConfig } from '../../features/auth/api/get-public-config';
import { DemoSignIns } from '../../features/auth/components/demo-sign-ins';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useDocumentTitle } from '../use-document-title';

export function SignInRoute() {
  useDocumentTitle('Sign in');
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const config = usePublicConfig();
  const [prefill, setPrefill] = useState<SignInInput>();
  const next = safeNextPath(params.get('next'));

  return (
    <AuthLayout
      title="Sign in"
      lead="Use the e-mail address your administrator invited."
      aside={config.data?.demoMode ? <DemoSignIns signIns={config.data.demoSignIns} onPick={(email, password) => setPrefill({ email, password })} /> : undefined}
    >
      <SignInForm
        prefill={prefill}
        onSignedIn={() => void navigate(next, { replace: true })}
      />
      <p className="mt-5 text-sm">
        <Link to={paths.forgotPassword} className="font-medium text-brand underline underline-offset-2">
          Forgot your password?
        </Link>
      </p>
    </AuthLayout>
  );
}
