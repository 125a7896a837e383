import { eq } from 'drizzle-orm';
import type { ProcessKind } from '../../../shared/schemas/layer-checks';
import type { DbOrTx } from '../../db/client';
import { layerChecks } from '../../db/schema/layer-checks';
import { NotFoundError, UnprocessableError } from '../../errors';

/** The parts of a layer check that set-ups and spreads attach to. */
export interface CheckAtRevision {
  id: string;
  title: string;
  revision: number;
  processKind: ProcessKind;
  fluidId: string;
  input: (typeof layerChecks.$inferSelect)['input'];
}

/**
 * The current revision of a layer check, or 404. With `kinds`, a check of another process kind is
 * refused with 422 naming the process kind (a Drying path needs a drying coat or cast film, …).
 */
export async function findCheckAtRevision(db: DbOrTx, id: string, kinds?: readonly ProcessKind[], purpose = 'this'): Promise<CheckAtRevision> {
  const [row] = await db
    .select({
      id: layerChecks.id,
      title: layerChecks.title,
      revision: layerChecks.revision,
      processKind: layerChecks.processKind,
      fluidId: layerChecks.fluidId,
      input: layerChecks.input,
    })
    .from(layerChecks)
    .where(eq(layerChecks.id, id))
    .limit(1);
  if (!row) throw new NotFoundError('There is no layer check with this id.');
  if (kinds && !kinds.includes(row.processKind)) {
    const message = `${purpose} needs a layer check of process kind ${kinds.join(' or ')}; this check is ${row.processKind}.`;
    throw new UnprocessableError(message, { processKind: message });
  }
  return row;
}
