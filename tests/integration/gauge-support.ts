/**
 * Gauge log test support: a released check (a signed process sheet revision) built through the real
 * fluid and layer-check API, with the snapshot a signed sheet freezes, inserted straight into the
 * sheet tables (the sheet workflow has its own tests).
 */
import { createHash, randomUUID } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import { processSheets, sheetRevisions, sheetSignatures } from '../../server/db/schema';
import type { Database } from '../../server/db/client';
import type { SheetSnapshot } from '../../shared/schemas/sheets';

import { roundFluid } from './helpers/round-fluid';

export { roundFluid };

/** Pearson's layer at onset at 1 mm: Ma = 100 × 0.79607 = 79.607 (Pearson 1958, J. Fluid Mech. 4:489). */
export const pearsonCheck = {
  processKind: 'general-layer',
  temperature: '20 °C',
  depth: '1 mm',
  bottom: { mechanics: 'rigid', thermal: 'conducting' },
  top: 'surface',
  deformableSurface: false,
  heating: { mode: 'deltaT', deltaT: '0.79607 K' },
};

export interface ReleasedCheckFixture {
  revisionId: string;
  sheetId: string;
  checkId: string;
  number: string;
  line: string;
}

async function ok<T = any>(call: Promise<{ status: number; body: T }>, status: number): Promise<T> {
  const response = await call;
  if (response.status !== status) throw new Error(`expected ${status}, got ${response.status}: ${JSON.stringify(response.body)}`);
  return response.body;
}

/** A signed revision of a new sheet for a new Pearson check owned by `engineer`. */
export async function createReleasedCheck(
  db: Database,
  engineer: TestAgent,
  engineerId: string,
  options: { line?: string; check?: Record<string, unknown>; state?: 'signed' | 'draft' } = {},
): Promise<ReleasedCheckFixture> {
  const fluid = await ok(engineer.post('/api/fluids').send({ ...roundFluid, name: `Gauge fluid ${randomUUID().slice(0, 8)}` }), 201);
  const checkInput = { title: `Gauge check ${randomUUID().slice(0, 6)}`, fluidId: fluid.id, ...pearsonCheck, ...options.check };
  const check = await ok(engineer.post('/api/layer-checks').send(checkInput), 201);
  const results = await ok(engineer.post('/api/layer-checks/evaluate').send(checkInput), 200);
  const window = await ok(engineer.get(`/api/layer-checks/${check.id}/window`), 200);
  const { margin: _omit, ...windowWithoutGrid } = window;
  const line = options.line ?? 'Line 2';
  const input = checkInput as typeof pearsonCheck & { alertThreshold?: number };
  const snapshot: SheetSnapshot = {
    format: 1,
    solverVersion: 'test',
    site: { company: 'Larkspur Coatings', name: 'Test site', code: 'LC' },
    check: { id: check.id, title: checkInput.title, notes: '', revision: 1, savedAt: new Date().toISOString(), savedByName: null, processKind: input.processKind as 'general-layer' },
    input: {
      temperature: input.temperature,
      depth: input.depth,
      bottom: input.bottom,
      top: input.top,
      deformableSurface: input.deformableSurface,
      heating: input.heating as Record<string, string>,
      lateral: null,
      panelWidth: null,
      soluteFractionDifference: null,
      alertThreshold: input.alertThreshold ?? 1.25,
    },
    fluid: { id: fluid.id, name: fluid.name, kind: 'other', referenceTemperature: '20 °C', validRange: null, properties: [] },
    results,
    window: windowWithoutGrid,
  };
  const number = `T-GL-${randomUUID().slice(0, 8)}`;
  const [sheet] = await db.insert(processSheets).values({ number, siteCode: 'T', checkId: check.id, createdBy: engineerId }).returning();
  const pdf = Buffer.from(`%PDF-1.4 test sheet ${number}`);
  const sha = createHash('sha256').update(pdf).digest('hex');
  const state = options.state ?? 'signed';
  const [revision] = await db
    .insert(sheetRevisions)
    .values({
      sheetId: sheet.id,
      revision: 1,
      state,
      title: checkInput.title,
      line,
      purpose: 'Gauge log test',
      authorId: engineerId,
      checkRevision: 1,
      snapshot,
      solverVersion: 'test',
      signedPdf: state === 'signed' ? pdf : null,
      pdfSha256: state === 'signed' ? sha : null,
    })
    .returning();
  if (state === 'signed') {
    await db.insert(sheetSignatures).values({
      revisionId: revision.id,
      signerId: engineerId,
      printedName: 'Test reviewer',
      signerRole: 'reviewer',
      meaning: 'approved-for-production',
      signedAt: new Date(),
      pdfSha256: sha,
    });
  }
  return { revisionId: revision.id, sheetId: sheet.id, checkId: check.id, number, line };
}
