import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layout/auth-layout';
import { Notice } from '../../components/ui/notice';
import { paths } from '../../config/paths';
import { useConfirmPasswordReset } from '../../features/auth/api/password-reset';
import { NewPasswordFields } from '../../features/auth/components/new-password-form';
import { isApiError } from '../../lib/api-client';
import { useDocumentTitle } from '../use-document-title';

export function ResetPasswordRoute() {
  useDocumentTitle('Set a new password');
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const confirm = useConfirmPasswordReset();
  const [done, setDone] = useState(false);
  const tokenRejected = isApiError(confirm.error) && confirm.error.code === 'invalid_token';

  return (
    <AuthLayout title="Set a new password">
      {!token ? (
        <Notice tone="error" title="This link has no reset token">
          Open the link from the reset e-mail in full, or ask for a new one.
        </Notice>
      ) : done ? (
        <Notice tone="success" title="Password changed">
          Your new password is set. Sign in with it now.
        </Notice>
      ) : tokenRejected ? (
        <Notice tone="error" title="This reset link no longer works">
          {confirm.error?.message} A link works once and only for a limited time. Ask for a new one.
        </Notice>
      ) : (
        <NewPasswordFields
          submitLabel="Set new password"
          busy={confirm.isPending}
          onSubmitPassword={(password) => confirm.mutateAsync({ token, password }).then(() => setDone(true))}
        />
      )}
      <p className="mt-5 flex flex-wrap gap-x-5 gap-y-2 text-sm">
        <Link to={paths.signIn} className="font-medium text-brand underline underline-offset-2">
          Sign in
        </Link>
        <Link to={paths.forgotPassword} className="font-medium text-brand underline underline-offset-2">
          Ask for a new link
        </Link>
      </p>
    </AuthLayout>
  );
}
