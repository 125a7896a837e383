import type { DbOrTx } from '../../db/client';
import { enqueueMail } from '../../mail/enqueue-mail';
import { formatSignificant } from '../../../shared/units/format-significant';
import type { RevisionContext } from './gauge-log.repository';

export interface AlertBatch {
  clientBatchId: string;
  source: 'upload' | 'device';
  readingCount: number;
  quietCount: number;
  closeCount: number;
  overCount: number;
  worstMargin: number | null;
  /** Runs with Over readings and the note opened or added to for each. */
  runs: { run: string; overCount: number }[];
}

/**
 * Queue the one alert e-mail of a batch with Over readings to the owner of the released check, in
 * the transaction that saves the batch (the mail exists exactly when the readings do).
 */
export async function enqueueOverAlert(tx: DbOrTx, publicUrl: string, context: RevisionContext, batch: AlertBatch): Promise<void> {
  const link = `${publicUrl}/gauge/${context.revisionId}?flag=over`;
  const worst = batch.worstMargin === null ? 'no onset' : formatSignificant(batch.worstMargin, 3);
  const runs = batch.runs.map((r) => `  - run ${r.run}: ${r.overCount} Over`).join('\n');
  const text = [
    `Hello ${context.ownerName},`,
    '',
    `A ${batch.source === 'device' ? 'gauge post' : 'file upload'} against ${context.number} revision ${context.revision} (${context.title}, ${context.line}) has readings over the quiet window.`,
    '',
    `Batch: ${batch.clientBatchId}`,
    `Readings: ${batch.readingCount} (Quiet ${batch.quietCount}, Close ${batch.closeCount}, Over ${batch.overCount})`,
    `Worst onset margin: ${worst} (below 1 means cells can set in at that thickness)`,
    'Runs with Over readings (a nonconformance note is open for each):',
    runs,
    '',
    `See the readings: ${link}`,
    '',
    'QuietLayer judged each reading with the signed sheet as released. Follow your site procedure for held material.',
  ].join('\n');
  await enqueueMail(tx, {
    to: context.ownerEmail,
    subject: `Over readings: ${context.number} rev ${context.revision}, ${context.line}, batch ${batch.clientBatchId}`,
    text,
    kind: 'gauge-over-alert',
  });
}
