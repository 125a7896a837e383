import { useId, useState, type ChangeEvent } from 'react';
import { onsetCaseInputFields, type OnsetCaseResult } from '../../../shared/schemas/onset';
import { Button } from '../../components/ui/button';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { UnitSystemSelect } from '../../components/units/unit-system-select';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { useEvaluateBatch } from '../../features/batch/api/evaluate-batch';
import { BatchResults } from '../../features/batch/components/batch-results';
import { readCaseFile, type CaseFile } from '../../features/batch/components/read-case-file';
import { useUnitSystem } from '../../lib/unit-system';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.batch);

function BatchPage() {
  const inputId = useId();
  const [system] = useUnitSystem();
  const [file, setFile] = useState<{ name: string; content: CaseFile }>();
  const [fileError, setFileError] = useState<string>();
  const [done, setDone] = useState(0);
  const [results, setResults] = useState<OnsetCaseResult[]>();
  const evaluate = useEvaluateBatch();

  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0];
    setFile(undefined);
    setFileError(undefined);
    setResults(undefined);
    evaluate.reset();
    if (!chosen) return;
    try {
      setFile({ name: chosen.name, content: readCaseFile(chosen.name, await chosen.text()) });
    } catch (error) {
      setFileError(error instanceof Error ? error.message : String(error));
    }
  };

  const run = () => {
    if (!file) return;
    setDone(0);
    evaluate.mutate({ cases: file.content.cases, onProgress: setDone }, { onSuccess: setResults });
  };

  const total = file?.content.cases.length ?? 0;

  return (
    <>
      <PageHeader
        title="Batch"
        lead="Many onset cases at once, in the format of the onset command: a CSV with a header row or a JSON array, SI units, one case per row."
        actions={<UnitSystemSelect />}
      />
      <div className="flex flex-col gap-5">
        <section className="flex flex-col gap-3 rounded-md border border-slate-line bg-paper-raised p-5" aria-labelledby="batch-file-title">
          <h2 id="batch-file-title" className="text-lg font-semibold">
            Cases file
          </h2>
          <p className="text-sm text-ink-soft">
            Columns: <code className="text-[0.85rem] break-words">{onsetCaseInputFields.join(', ')}</code>. A case gives either rayleigh / marangoni / biot, or the
            physical fields density … deltaT (SI: kg/m³, Pa·s, W/(m·K), J/(kg·K), 1/K, N/m, N/(m·K), m, K). Blank cells mean “not given”.
          </p>
          <div className="flex flex-wrap items-end gap-3">
            <div className="flex flex-col gap-1">
              <label htmlFor={inputId} className="text-sm font-semibold">
                CSV or JSON file
              </label>
              <input id={inputId} type="file" accept=".csv,.json,text/csv,application/json" onChange={onFile} data-testid="batch-file" className="text-sm file:mr-3 file:min-h-10 file:rounded-md file:border file:border-slate-line file:bg-paper file:px-3" />
            </div>
            {file && (
              <Button onClick={run} busy={evaluate.isPending} data-testid="batch-run">
                Evaluate {total} {total === 1 ? 'case' : 'cases'}
              </Button>
            )}
          </div>
          {fileError && <Notice tone="error" title="The file could not be read">{fileError}</Notice>}
          {evaluate.isPending && (
            <div className="flex flex-col gap-1" role="status" aria-live="polite">
              <progress max={total} value={done} className="h-2 w-full max-w-md accent-brand" aria-label="Cases evaluated" />
              <span className="text-sm text-ink-soft tabular-nums">
                {done} of {total} cases evaluated…
              </span>
            </div>
          )}
          {evaluate.isError && <Notice tone="error" title="The batch was not evaluated">{evaluate.error.message}</Notice>}
        </section>
        {results && file && <BatchResults results={results} where={file.content.where} fileName={file.name} system={system} />}
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Batch');
  return (
    <RoleGate roles={roles} pageName="Batch">
      <BatchPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
