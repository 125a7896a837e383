import { useState } from 'react';
import { readingColumnFieldValues, type BatchSummary, type UploadOptions, type UploadPreview } from '../../../../shared/schemas/gauge-log';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import type { ApiError } from '../../../lib/api-client';
import { useUnitSystem } from '../../../lib/unit-system';
import { useCommitUpload, usePreviewUpload } from '../api/gauge-mutations';
import { FlagBadge } from './flag-badge';
import { formatMargin, formatThickness } from './format-gauge';

const fieldLabels: Record<(typeof readingColumnFieldValues)[number], string> = {
  run: 'Run or batch id',
  position: 'Position along the web',
  time: 'Time of reading',
  direction: 'Direction (MD/CD)',
  thickness: 'Thickness',
  substrateTemperature: 'Substrate temperature',
  airTemperature: 'Air temperature',
  operator: 'Operator',
};
const unitChoices = {
  thickness: ['µm', 'mil', 'mm'],
  position: ['m', 'mm', 'in'],
  substrateTemperature: ['°C', '°F', 'K'],
  airTemperature: ['°C', '°F', 'K'],
} as const;
type UnitField = keyof typeof unitChoices;

type RowErrors = { line: number; column: string | null; message: string }[];

/** Upload a gauge CSV: choose the file, check the detected columns and units, preview, then save all or nothing. */
export function UploadPanel({ revisionId, onSaved }: { revisionId: string; onSaved: (batch: BatchSummary) => void }) {
  const [system] = useUnitSystem();
  const [file, setFile] = useState<File | null>(null);
  const [columns, setColumns] = useState<Record<string, string>>({});
  const [units, setUnits] = useState<Record<string, string>>({});
  const [basis, setBasis] = useState<'wet' | 'dry'>('wet');
  const [volumeSolids, setVolumeSolids] = useState('');
  const [thinner, setThinner] = useState('0');
  const [gaugeType, setGaugeType] = useState('');
  const [calibrationDate, setCalibrationDate] = useState('');
  const [preview, setPreview] = useState<UploadPreview | null>(null);
  const [saved, setSaved] = useState<BatchSummary | null>(null);
  const [inputKey, setInputKey] = useState(0);
  const previewing = usePreviewUpload();
  const committing = useCommitUpload();

  const options = (): UploadOptions => ({
    columns,
    units,
    thicknessBasis: basis,
    ...(basis === 'dry' ? { volumeSolidsPercent: Number(volumeSolids), thinnerPercent: Number(thinner || 0) } : {}),
    gaugeType: gaugeType || undefined,
    calibrationDate: calibrationDate || undefined,
  });

  const runPreview = (next?: { columns?: Record<string, string>; units?: Record<string, string> }, chosen = file) => {
    if (!chosen) return;
    previewing.mutate(
      { revisionId, file: chosen, options: { ...options(), ...next } },
      {
        onSuccess: (result) => {
          setPreview(result);
          setColumns(result.used.columns);
          setUnits(result.used.units);
        },
      },
    );
  };

  const error = (committing.error ?? previewing.error) as (ApiError & { rowErrors?: RowErrors }) | null;
  const rowErrors: RowErrors = error?.rowErrors ?? preview?.errors ?? [];
  const mappingErrors = preview?.mappingErrors ?? {};
  const canSave = preview !== null && preview.errorCount === 0 && Object.keys(mappingErrors).length === 0 && preview.validCount > 0;

  return (
    <section aria-labelledby="upload-heading" className="flex flex-col gap-4 rounded-lg border border-slate-line bg-paper-raised p-4">
      <h2 id="upload-heading" className="text-lg font-semibold">
        Upload gauge readings (CSV)
      </h2>
      <p className="text-sm text-ink-soft">
        One reading per row with a header line. Units can sit in the header, e.g. <code>thickness [µm]</code>, <code>air [°F]</code>. Nothing is saved until every row reads
        cleanly; then the whole file is saved at once. Up to 20 MB.
      </p>
      <div className="grid gap-3 md:grid-cols-2 xl:grid-cols-4">
        <Field label="CSV file">
          {({ id }) => (
            <Input
              key={inputKey}
              id={id}
              type="file"
              accept=".csv,text/csv,text/plain"
              onChange={(e) => {
                const chosen = e.target.files?.[0] ?? null;
                setFile(chosen);
                setPreview(null);
                setColumns({});
                setUnits({});
                committing.reset();
                setSaved(null);
                if (chosen) runPreview({ columns: {}, units: {} }, chosen);
              }}
            />
          )}
        </Field>
        <Field label="Readings are" hint="Dry readings are converted to wet: WFT = DFT ÷ (VS ÷ (1 + thinner)).">
          {({ id, describedBy }) => (
            <Select id={id} aria-describedby={describedBy} value={basis} onChange={(e) => setBasis(e.target.value as 'wet' | 'dry')}>
              <option value="wet">Wet film thickness</option>
              <option value="dry">Dry film thickness</option>
            </Select>
          )}
        </Field>
        <Field label="Gauge type">{({ id }) => <Input id={id} value={gaugeType} onChange={(e) => setGaugeType(e.target.value)} placeholder="e.g. wet comb, inline β gauge" />}</Field>
        <Field label="Calibration date" hint="Calibrate and verify the gauge before measuring (ASTM D7091).">
          {({ id, describedBy }) => <Input id={id} aria-describedby={describedBy} type="date" value={calibrationDate} onChange={(e) => setCalibrationDate(e.target.value)} />}
        </Field>
        {basis === 'dry' && (
          <>
            <Field label="Volume solids [%]">
              {({ id }) => <Input id={id} inputMode="decimal" value={volumeSolids} onChange={(e) => setVolumeSolids(e.target.value)} />}
            </Field>
            <Field label="Thinner added [% by volume]">{({ id }) => <Input id={id} inputMode="decimal" value={thinner} onChange={(e) => setThinner(e.target.value)} />}</Field>
          </>
        )}
      </div>

      {preview && (
        <fieldset className="grid gap-3 rounded-md border border-slate-line p-3 md:grid-cols-2 xl:grid-cols-4">
          <legend className="px-1 text-sm font-semibold">Columns in {preview.fileName}</legend>
          {readingColumnFieldValues.map((field) => (
            <div key={field} className="flex flex-col gap-2">
              <Field label={fieldLabels[field]} error={mappingErrors[field]}>
                {({ id, describedBy, invalid }) => (
                  <Select
                    id={id}
                    aria-describedby={describedBy}
                    aria-invalid={invalid}
                    value={columns[field] ?? ''}
                    onChange={(e) => setColumns((c) => ({ ...c, [field]: e.target.value }))}
                  >
                    <option value="">— not in the file —</option>
                    {preview.headers.map((h) => (
                      <option key={h} value={h}>
                        {h}
                      </option>
                    ))}
                  </Select>
                )}
              </Field>
              {field in unitChoices && columns[field] && (
                <Field label={`${fieldLabels[field]}: unit`} error={mappingErrors[`units.${field}`]}>
                  {({ id, describedBy, invalid }) => (
                    <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} value={units[field] ?? ''} onChange={(e) => setUnits((u) => ({ ...u, [field]: e.target.value }))}>
                      <option value="">— choose —</option>
                      {[...new Set([...(units[field] ? [units[field]] : []), ...unitChoices[field as UnitField]])].map((u) => (
                        <option key={u} value={u}>
                          {u}
                        </option>
                      ))}
                    </Select>
                  )}
                </Field>
              )}
            </div>
          ))}
        </fieldset>
      )}

      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" disabled={!file} busy={previewing.isPending} onClick={() => runPreview()}>
          Check the file again
        </Button>
        <Button
          disabled={!canSave || !file}
          busy={committing.isPending}
          onClick={() =>
            file &&
            committing.mutate(
              { revisionId, file, options: options() },
              {
                onSuccess: (batch) => {
                  setPreview(null);
                  setFile(null);
                  setInputKey((k) => k + 1);
                  setSaved(batch);
                  onSaved(batch);
                },
              },
            )
          }
        >
          Save {preview ? preview.validCount.toLocaleString('en-GB') : ''} readings
        </Button>
      </div>

      {saved && (
        <Notice tone={saved.overCount > 0 ? 'caution' : 'success'} title={`Saved ${saved.readingCount.toLocaleString('en-GB')} readings from ${saved.fileName ?? 'the file'}`}>
          Quiet {saved.quietCount}, Close {saved.closeCount}, Over {saved.overCount}
          {saved.overCount > 0 ? ' — the check’s owner has been e-mailed and a nonconformance note is open for each run with Over readings.' : '.'}
        </Notice>
      )}
      {error && (
        <Notice tone="error" title={error.status === 413 ? 'File too large' : 'The file was not saved'}>
          {error.message}
        </Notice>
      )}
      {preview && (
        <div className="flex flex-col gap-3">
          <p className="text-sm" data-testid="preview-summary">
            {preview.rowCount.toLocaleString('en-GB')} rows · {preview.validCount.toLocaleString('en-GB')} read cleanly · {preview.errorCount} with problems · judged: Quiet{' '}
            {preview.counts.quiet}, Close {preview.counts.close}, Over {preview.counts.over}
          </p>
          {rowErrors.length > 0 && (
            <Notice tone="error" title={`${preview.errorCount} problem${preview.errorCount === 1 ? '' : 's'}: fix the file and choose it again`}>
              <ul className="list-disc pl-5">
                {rowErrors.slice(0, 30).map((e, i) => (
                  <li key={i}>
                    Line {e.line}
                    {e.column ? `, column “${e.column}”` : ''}: {e.message}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
          {preview.judged.length > 0 && (
            <div className="overflow-x-auto">
              <table className="min-w-full text-sm tabular-nums">
                <caption className="text-left font-semibold">First readings as they will be judged</caption>
                <thead>
                  <tr className="text-left text-ink-soft">
                    <th className="py-1 pr-3">Line</th>
                    <th className="pr-3">Run</th>
                    <th className="pr-3">As entered</th>
                    <th className="pr-3">Wet thickness</th>
                    <th className="pr-3">Margin</th>
                    <th>Verdict</th>
                  </tr>
                </thead>
                <tbody>
                  {preview.judged.map((r) => (
                    <tr key={r.line} className="border-t border-slate-line">
                      <td className="py-1 pr-3">{r.line}</td>
                      <td className="pr-3">{r.run}</td>
                      <td className="pr-3">
                        {r.enteredThickness} {r.enteredUnit}
                      </td>
                      <td className="pr-3">{formatThickness(r.wetThickness, system)}</td>
                      <td className="pr-3">{formatMargin(r.margin)}</td>
                      <td>
                        <FlagBadge flag={r.flag} />
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </div>
      )}
    </section>
  );
}
