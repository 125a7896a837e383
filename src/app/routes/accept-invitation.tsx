import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { roleLabels } from '../../../shared/schemas/roles';
import { AuthLayout } from '../../components/layout/auth-layout';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { paths } from '../../config/paths';
import { useAcceptInvitation, useInvitation } from '../../features/auth/api/invitations';
import { NewPasswordFields } from '../../features/auth/components/new-password-form';
import { isApiError } from '../../lib/api-client';
import { useDocumentTitle } from '../use-document-title';

export function AcceptInvitationRoute() {
  useDocumentTitle('Accept invitation');
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation();
  const navigate = useNavigate();

  let body;
  if (!token) {
    body = (
      <Notice tone="error" title="This link has no invitation token">
        Open the link from the invitation e-mail in full.
      </Notice>
    );
  } else if (invitation.isPending) {
    body = <Loading label="Looking up the invitation…" />;
  } else if (invitation.isError) {
    body = (
      <Notice tone="error" title={isApiError(invitation.error) && invitation.error.status === 404 ? 'This invitation is not valid' : 'Could not load the invitation'}>
        {isApiError(invitation.error) && invitation.error.status === 404
          ? 'It may have been used already or have expired. Ask your administrator to send a new one.'
          : invitation.error.message}
      </Notice>
    );
  } else {
    const preview = invitation.data;
    body = (
      <>
        <dl className="mb-5 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-paper-sunk px-4 py-3 text-[0.95rem]">
          <dt className="text-ink-soft">Name</dt>
          <dd className="font-semibold">{preview.displayName}</dd>
          <dt className="text-ink-soft">E-mail</dt>
          <dd className="break-all">{preview.email}</dd>
          <dt className="text-ink-soft">Role</dt>
          <dd>{roleLabels[preview.role]}</dd>
        </dl>
        <NewPasswordFields
          submitLabel="Set password and sign in"
          busy={accept.isPending}
          onSubmitPassword={(password) => accept.mutateAsync({ token, password }).then(() => navigate(paths.home, { replace: true }))}
        />
      </>
    );
  }

  return (
    <AuthLayout title="Join QuietLayer" lead="You have been invited. Choose a password to finish your account.">
      {body}
      <p className="mt-5 text-sm">
        <Link to={paths.signIn} className="font-medium text-brand underline underline-offset-2">
          Already have an account? Sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
