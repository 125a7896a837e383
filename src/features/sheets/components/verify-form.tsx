import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { roleLabels } from '../../../../shared/schemas/roles';
import { sheetStateLabels } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../utils/format';
import { useVerifySheetPdf } from '../api/verify-sheet';

/** Upload a PDF; QuietLayer says which signed sheet revision it is (by SHA-256), or that it matches none. */
export function VerifyForm() {
  const verify = useVerifySheetPdf();
  const [file, setFile] = useState<File | null>(null);
  const [error, setError] = useState<string>();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setError(undefined);
    if (!file) {
      setError('Choose the PDF file to check.');
      return;
    }
    try {
      await verify.mutateAsync(file);
    } catch (e) {
      setError(isApiError(e) ? (e.fields?.file ?? e.message) : 'The file could not be checked.');
    }
  };
  const result = verify.data;
  return (
    <div className="flex max-w-3xl flex-col gap-4">
      <form onSubmit={submit} noValidate className="flex flex-col gap-4 rounded-md border border-slate-line bg-paper-raised p-4">
        <Field label="Process sheet PDF" error={error} hint="At most 20 MB. The file is compared byte for byte (SHA-256); it is not kept.">
          {({ id, describedBy, invalid }) => (
            <input
              id={id}
              type="file"
              accept="application/pdf,.pdf"
              aria-describedby={describedBy}
              aria-invalid={invalid}
              onChange={(e) => {
                setFile(e.target.files?.[0] ?? null);
                verify.reset();
              }}
              className="block min-h-11 w-full text-ink file:mr-3 file:min-h-11 file:rounded-md file:border file:border-slate-line file:bg-paper-sunk file:px-4 file:text-ink"
            />
          )}
        </Field>
        <div>
          <Button type="submit" busy={verify.isPending}>
            Verify
          </Button>
        </div>
      </form>
      {result?.match === true && (
        <Notice tone="success" title={`This is the signed PDF of ${result.number} revision ${result.revision}`}>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="font-semibold">Title</dt>
            <dd>{result.title}</dd>
            <dt className="font-semibold">Signed by</dt>
            <dd>
              {result.signature.printedName}, {roleLabels[result.signature.role]}
            </dd>
            <dt className="font-semibold">Signed at</dt>
            <dd>
              {formatDateTime(result.signature.signedAt, 'UTC')} UTC
            </dd>
            <dt className="font-semibold">Meaning</dt>
            <dd>{result.signature.meaningText}</dd>
            <dt className="font-semibold">State now</dt>
            <dd>
              {sheetStateLabels[result.state]}
              {result.state === 'superseded' && ' — a later revision replaces it; do not run the line from this copy.'}
            </dd>
            <dt className="font-semibold">SHA-256</dt>
            <dd className="font-mono text-sm break-all">{result.sha256}</dd>
          </dl>
          <p className="mt-2">
            <Link to={`/sheets/${result.revisionId}`} className="text-brand-dark underline underline-offset-2">
              Open the sheet
            </Link>
          </p>
        </Notice>
      )}
      {result?.match === false && (
        <Notice tone="error" title="This PDF matches no signed process sheet">
          <p>
            Its SHA-256 is <span className="font-mono text-sm break-all">{result.sha256}</span>. It may be a draft, a changed copy, or not from this site: do
            not rely on it.
          </p>
        </Notice>
      )}
    </div>
  );
}
