import { useId, useState, type ChangeEvent } from 'react';
import type { FluidCsvPreview } from '../../../../shared/schemas/fluids';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useCommitFluidCsv, usePreviewFluidCsv } from '../api/import-fluids';

/**
 * CSV import in two steps: the server reads the file and answers a preview with line-numbered
 * errors; only a file with no error can be committed, and the commit saves every row or none.
 */
export function FluidImport() {
  const inputId = useId();
  const [csv, setCsv] = useState<string>();
  const [fileName, setFileName] = useState<string>();
  const [preview, setPreview] = useState<FluidCsvPreview>();
  const [created, setCreated] = useState<number>();
  const previewCsv = usePreviewFluidCsv();
  const commit = useCommitFluidCsv();

  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    setPreview(undefined);
    setCreated(undefined);
    commit.reset();
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    setFileName(file.name);
    previewCsv.mutate(text, { onSuccess: setPreview });
  };

  return (
    <section aria-labelledby="fluid-import-title" className="flex flex-col gap-3 rounded-md border border-slate-line bg-paper-raised p-5">
      <div>
        <h2 id="fluid-import-title" className="text-lg font-semibold">
          Import fluids from CSV
        </h2>
        <p className="text-sm text-ink-soft">
          Use the columns of the export (download it to start from a template). You see every row and every problem, by line number, before anything is
          saved; the import then saves all rows or none.
        </p>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={inputId} className="text-sm font-semibold">
          CSV file
        </label>
        <input id={inputId} type="file" accept=".csv,text/csv" onChange={onFile} data-testid="fluid-csv-file" className="text-sm file:mr-3 file:min-h-10 file:rounded-md file:border file:border-slate-line file:bg-paper file:px-3" />
      </div>
      {previewCsv.isPending && <p className="text-sm text-ink-soft">Reading {fileName}…</p>}
      {previewCsv.isError && <Notice tone="error" title="The file could not be read">{previewCsv.error.message}</Notice>}
      {preview && (
        <div className="flex flex-col gap-3" data-testid="fluid-csv-preview">
          <p className="text-sm">
            {fileName}: {preview.rows.length} {preview.rows.length === 1 ? 'row' : 'rows'}, {preview.errors.length} {preview.errors.length === 1 ? 'problem' : 'problems'}.
          </p>
          {preview.rows.length > 0 && (
            <div className="max-h-64 overflow-auto rounded-md border border-slate-line">
              <table className="w-full text-left text-sm">
                <caption className="sr-only">Rows in the file</caption>
                <thead className="bg-paper-sunk">
                  <tr>
                    <th scope="col" className="px-2 py-1.5">Line</th>
                    <th scope="col" className="px-2 py-1.5">Name</th>
                    <th scope="col" className="px-2 py-1.5">Kind</th>
                    <th scope="col" className="px-2 py-1.5">Row</th>
                  </tr>
                </thead>
                <tbody>
                  {preview.rows.map((row) => (
                    <tr key={row.line} className="border-t border-slate-line/70">
                      <td className="px-2 py-1 tabular-nums">{row.line}</td>
                      <td className="px-2 py-1">{row.name}</td>
                      <td className="px-2 py-1">{row.kind}</td>
                      <td className="px-2 py-1">{row.valid ? '✓ ready' : '✕ has problems'}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {preview.errors.length > 0 && (
            <Notice tone="error" title="Fix these lines, then choose the file again">
              <ul className="mt-1 flex flex-col gap-0.5" data-testid="fluid-csv-errors">
                {preview.errors.map((error, index) => (
                  <li key={index}>
                    Line {error.line}
                    {error.field && <> · <code className="text-sm">{error.field}</code></>}: {error.message}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
          {preview.ok && created === undefined && (
            <Button
              className="self-start"
              busy={commit.isPending}
              onClick={() => csv && commit.mutate(csv, { onSuccess: (result) => setCreated(result.created) })}
            >
              Import {preview.rows.length} {preview.rows.length === 1 ? 'fluid' : 'fluids'}
            </Button>
          )}
          {commit.isError && <Notice tone="error" title="Nothing was imported">{commit.error.message}</Notice>}
          {created !== undefined && (
            <Notice tone="success" title="Imported">
              {created} {created === 1 ? 'fluid was' : 'fluids were'} added to the library.
            </Notice>
          )}
        </div>
      )}
    </section>
  );
}
