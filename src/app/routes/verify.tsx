import { PageHeader } from '../../components/ui/page-header';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { VerifyForm } from '../../features/sheets/components/verify-form';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.verify);

export function Component() {
  useDocumentTitle('Verify a PDF');
  return (
    <RoleGate roles={roles} pageName="Verify a PDF">
      <PageHeader
        title="Verify a process sheet PDF"
        lead="Upload a PDF you were given. If its SHA-256 matches a signed record, you see which sheet and revision it is, who signed it and when; any change to the file, even one byte, makes it match nothing."
      />
      <VerifyForm />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
