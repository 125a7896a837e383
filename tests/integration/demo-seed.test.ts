import { createHash } from 'node:crypto';
import { and, eq, inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runDemoSeed } from '../../scripts/lib/seed/run-demo-seed';
import { DEMO_CHECK_TITLES } from '../../scripts/lib/seed/demo-checks';
import { demoUser, seededCheckId } from '../../scripts/lib/seed/demo-people';
import { createDatabase, type Database } from '../../server/db/client';
import { gaugeBatches, gaugeNotes, gaugeReadings, layerChecks, outboxMessages, processSheets, sheetRevisions, sheetSignatures } from '../../server/db/schema';
import { evaluateSavedLayerCheck, getLayerCheck, updateLayerCheck } from '../../server/features/layer-checks/layer-checks.service';
import { verifySheetPdf } from '../../server/features/sheets/sheets.service';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';

// A database of its own: the demo seed is run on it several times and its rows are counted.
let scratch: ScratchDatabase;
let db: Database;
let closePool: () => Promise<void>;
const quiet = { bcryptCost: 4, log: () => {} };
const titles = Object.values(DEMO_CHECK_TITLES);

beforeAll(async () => {
  scratch = await createScratchDatabase();
  const created = createDatabase(scratch.url, { max: 2 });
  db = created.db;
  closePool = () => created.pool.end();
}, 180_000);

afterAll(async () => {
  await closePool?.();
  await scratch?.drop();
});

async function counts() {
  const [checks] = await db.select({ n: sql<number>`count(*)::int` }).from(layerChecks);
  const [sheets] = await db.select({ n: sql<number>`count(*)::int` }).from(sheetRevisions);
  const [signatures] = await db.select({ n: sql<number>`count(*)::int` }).from(sheetSignatures);
  const [batches] = await db.select({ n: sql<number>`count(*)::int` }).from(gaugeBatches);
  const [readings] = await db.select({ n: sql<number>`count(*)::int` }).from(gaugeReadings);
  const [mail] = await db.select({ n: sql<number>`count(*)::int` }).from(outboxMessages);
  return { checks: checks.n, sheets: sheets.n, signatures: signatures.n, batches: batches.n, readings: readings.n, mail: mail.n };
}

async function sheetOf(title: string) {
  const checkId = await seededCheckId(db, title);
  expect(checkId).toBeDefined();
  return db
    .select({ revision: sheetRevisions, number: processSheets.number })
    .from(sheetRevisions)
    .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
    .where(eq(processSheets.checkId, checkId as string));
}

describe('demo seed (Larkspur Coatings, invented)', () => {
  it('creates the checks, sheets and readings once, however often it runs', async () => {
    const first = await runDemoSeed(scratch.url, quiet);
    expect(first['demo layer checks']).toBe(7); // five checks, the Line 2 Drying path, the weld-cell pool set-up
    expect(first['demo process sheets']).toBe(3);
    expect(first['demo gauge readings']).toBe(3);
    const after = await counts();

    const second = await runDemoSeed(scratch.url, quiet);
    expect(Object.values(second).every((n) => n === 0)).toBe(true);
    expect(await counts()).toEqual(after);

    for (const title of titles) {
      const rows = await db.select({ id: layerChecks.id }).from(layerChecks).where(eq(layerChecks.title, title));
      expect(rows, title).toHaveLength(1);
    }
    // Only the natural notifications: two review requests, the signing notice, one Over alert.
    expect(after.mail).toBe(4);
  }, 240_000);

  it('takes the sheets to Signed, Awaiting review and Draft, owned by the demo engineer', async () => {
    const engineer = await demoUser(db, 'engineer@larkspur.example');
    const [zone1] = await sheetOf(DEMO_CHECK_TITLES.line2Zone1);
    const [caster] = await sheetOf(DEMO_CHECK_TITLES.casterB);
    const [weld] = await sheetOf(DEMO_CHECK_TITLES.weldRoot);
    expect(zone1.revision.state).toBe('signed');
    expect(caster.revision.state).toBe('awaiting-review');
    expect(weld.revision.state).toBe('draft');
    expect(zone1.revision.authorId).toBe(engineer?.id);
    // The released sheet carries the Line 2 Drying path saved with the check revision.
    expect(zone1.revision.snapshot.dryingPath?.zones).toHaveLength(3);
    const [signature] = await db.select().from(sheetSignatures).where(eq(sheetSignatures.revisionId, zone1.revision.id));
    expect(signature.meaning).toBe('approved-for-production');
    expect(signature.signerRole).toBe('reviewer');
  });

  it('stores a signed PDF whose SHA-256 (FIPS 180-4) is the one in the signature record, and the verify service finds it', async () => {
    const [zone1] = await sheetOf(DEMO_CHECK_TITLES.line2Zone1);
    const pdf = zone1.revision.signedPdf as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const [signature] = await db.select().from(sheetSignatures).where(eq(sheetSignatures.revisionId, zone1.revision.id));
    const sha = createHash('sha256').update(pdf).digest('hex');
    expect(signature.pdfSha256).toBe(sha);
    expect(zone1.revision.pdfSha256).toBe(sha);
    const reviewer = await demoUser(db, 'reviewer@larkspur.example');
    const result = await verifySheetPdf(db, reviewer!, pdf);
    expect(result).toMatchObject({ match: true, number: zone1.number, revision: 1, state: 'signed' });
    const spoiled = Buffer.from(pdf);
    spoiled[spoiled.length - 10] ^= 1;
    expect((await verifySheetPdf(db, reviewer!, spoiled)).match).toBe(false);
  });

  it('judges the Line 2 runs with the released check: a good run Quiet, a run that thins out Close then Over with a note', async () => {
    const [zone1] = await sheetOf(DEMO_CHECK_TITLES.line2Zone1);
    const batches = await db.select().from(gaugeBatches).where(eq(gaugeBatches.revisionId, zone1.revision.id));
    const byId = new Map(batches.map((b) => [b.clientBatchId, b]));
    expect(byId.get('demo-R-0412')).toMatchObject({ readingCount: 60, quietCount: 60, closeCount: 0, overCount: 0 });
    const drift = byId.get('demo-R-0413');
    expect(drift?.readingCount).toBe(60);
    expect(drift?.closeCount).toBeGreaterThan(0);
    expect(drift?.overCount).toBeGreaterThan(0);
    const notes = await db.select().from(gaugeNotes).where(and(eq(gaugeNotes.revisionId, zone1.revision.id), inArray(gaugeNotes.run, ['R-0412', 'R-0413', 'R-0414'])));
    expect(notes.map((n) => n.run)).toEqual(['R-0413']);
  });

  it('reproduces the textbook onset values in the silicone-oil calibration layer', async () => {
    const id = await seededCheckId(db, DEMO_CHECK_TITLES.siliconeCalibration);
    const evaluation = await evaluateSavedLayerCheck(db, id as string);
    // Nield D.A. (1964) Surface tension and buoyancy effects in cellular convection, J. Fluid Mech.
    // 19:341–352, rigid conducting bottom, flat free insulating top (Bi = 0): Ma_c = 79.607 with no
    // buoyancy (Pearson's problem) and Ra_c = 669.00 with no surface tension — values from memory.
    expect(evaluation.critical.marangoniAlone).toBeCloseTo(79.607, 1);
    expect(evaluation.critical.rayleighAlone).toBeCloseTo(669.0, 0);
  });

  it('never overwrites a demo row people changed: a renamed check keeps its name and is not made again', async () => {
    const engineer = await demoUser(db, 'engineer@larkspur.example');
    const id = (await seededCheckId(db, DEMO_CHECK_TITLES.casterB)) as string;
    const before = await getLayerCheck(db, id);
    const { id: _id, fluidName: _f, fluidArchived: _a, ownerId: _o, ownerName: _n, revision: _r, version, savedMargin: _m, savedRegime: _g, createdAt: _c, updatedAt: _u, ...input } = before;
    await updateLayerCheck(db, engineer!, id, { ...input, title: 'Caster B — dope on the belt, renamed by Priya', version } as Parameters<typeof updateLayerCheck>[3]);
    const changed = await counts();

    await runDemoSeed(scratch.url, quiet);
    expect((await getLayerCheck(db, id)).title).toBe('Caster B — dope on the belt, renamed by Priya');
    expect(await db.select({ id: layerChecks.id }).from(layerChecks).where(eq(layerChecks.title, DEMO_CHECK_TITLES.casterB))).toHaveLength(0);
    expect(await counts()).toEqual(changed);
  }, 120_000);
});
