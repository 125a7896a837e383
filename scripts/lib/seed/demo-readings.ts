import { and, desc, eq } from 'drizzle-orm';
import { uploadOptionsSchema } from '../../../shared/schemas/gauge-log';
import type { Database } from '../../../server/db/client';
import { gaugeBatches } from '../../../server/db/schema/gauge-log';
import { processSheets, sheetRevisions } from '../../../server/db/schema/sheets';
import { loadRevision, saveReadingBatch } from '../../../server/features/gauge-log/gauge-readings.service';
import { parseUpload } from '../../../server/features/gauge-log/gauge-uploads';
import { DEMO_CHECK_TITLES } from './demo-checks';
import { DEMO_TECHNICIAN, demoPublicUrl, demoUser, seededCheckId } from './demo-people';
import type { SeedStep } from './seed-step';

/** One invented run of wet-film readings: every 5 m along 300 m of web (one reading each 10 s at 30 m/min). */
interface DemoRun {
  run: string;
  /** Start of the run (UTC), INVENTED. */
  startedAt: string;
  /** Wet thickness [µm] at reading i of `count`. */
  thickness: (i: number, count: number) => number;
  count: number;
}

/**
 * A fixed ripple standing in for gauge scatter (no random numbers, so every seed gives the same
 * file): two incommensurate sines, within ±1 µm.
 */
const ripple = (i: number) => 0.6 * Math.sin(1.7 * i) + 0.4 * Math.sin(0.53 * i + 1);

/**
 * Larkspur Coatings Line 2 (INVENTED readings). With the released zone-1 check the film is quiet
 * from about 39 µm up (to millimetres): below that the evaporation-cooled film thins into dry spots
 * (long-wave thinning), so a coat that runs thin is what takes it out of the window.
 * - R-0412: a good run, 48–53 µm.
 * - R-0413: the metering gap creeping shut, 50 µm down to about 28 µm — Close, then Over.
 * - R-0414: after the gap was reset, back at about 51 µm.
 */
export const demoRuns: readonly DemoRun[] = Object.freeze([
  { run: 'R-0412', startedAt: '2025-03-11T06:10:00Z', count: 60, thickness: (i) => 50.5 + 1.5 * Math.sin(i / 6) + ripple(i) },
  { run: 'R-0413', startedAt: '2025-03-11T09:40:00Z', count: 60, thickness: (i, n) => 50 - (22 * i) / (n - 1) + 0.5 * ripple(i) },
  { run: 'R-0414', startedAt: '2025-03-11T13:05:00Z', count: 40, thickness: (i) => 51 + ripple(i) },
]);

/** The run as the CSV a wet-film gauge exports (the upload path of the gauge log reads it). */
export function demoRunCsv(run: DemoRun): string {
  const start = Date.parse(run.startedAt);
  const lines = ['Run,Position [m],Time,WFT [µm]'];
  for (let i = 0; i < run.count; i += 1) {
    const position = 5 * i;
    const time = new Date(start + i * 10_000).toISOString();
    lines.push(`${run.run},${position},${time},${run.thickness(i, run.count).toFixed(1)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** The signed revision of the zone-1 sheet (the released check), or undefined. */
async function releasedZone1Revision(db: Database): Promise<string | undefined> {
  const checkId = await seededCheckId(db, DEMO_CHECK_TITLES.line2Zone1);
  if (!checkId) return undefined;
  const [row] = await db
    .select({ id: sheetRevisions.id })
    .from(sheetRevisions)
    .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
    .where(and(eq(processSheets.checkId, checkId), eq(sheetRevisions.state, 'signed')))
    .orderBy(desc(sheetRevisions.revision))
    .limit(1);
  return row?.id;
}

/**
 * Uploads the demo runs on the signed Line 2 sheet as the line technician, through the gauge-log
 * upload path (CSV read, judged with the sheet's snapshot, all or nothing). R-0413's Over readings
 * open a nonconformance note and send the owner the one alert e-mail, as a real upload would.
 * A run already uploaded (batch id "demo-<run>" on that revision) is skipped.
 */
export const seedDemoReadings: SeedStep = {
  name: 'demo gauge readings',
  async run({ db, log }) {
    const technician = await demoUser(db, DEMO_TECHNICIAN);
    const revisionId = await releasedZone1Revision(db);
    if (!technician || !revisionId) return 0;
    const context = await loadRevision(db, revisionId, { released: true });
    let inserted = 0;
    for (const run of demoRuns) {
      const clientBatchId = `demo-${run.run}`;
      const [existing] = await db
        .select({ id: gaugeBatches.id })
        .from(gaugeBatches)
        .where(and(eq(gaugeBatches.revisionId, revisionId), eq(gaugeBatches.clientBatchId, clientBatchId)))
        .limit(1);
      if (existing) continue;
      const options = uploadOptionsSchema.parse({ gaugeType: 'Wet-film comb gauge (demo)', operator: technician.displayName });
      const parsed = parseUpload(demoRunCsv(run), options);
      if (parsed.errorCount > 0 || Object.keys(parsed.result.mappingErrors).length > 0) {
        throw new Error(`demo run ${run.run} does not read: ${JSON.stringify({ errors: parsed.result.errors.slice(0, 3), mapping: parsed.result.mappingErrors })}`);
      }
      const batch = await saveReadingBatch(
        db,
        context,
        parsed.result.readings,
        {
          source: 'upload',
          clientBatchId,
          uploadedBy: technician.id,
          fileName: `line2-${run.run}.csv`,
          gaugeType: options.gaugeType ?? null,
          calibrationDate: null,
          thicknessBasis: 'wet',
          defaultOperator: technician.displayName,
        },
        { actor: { id: technician.id, email: technician.email }, publicUrl: demoPublicUrl() },
      );
      log(`demo gauge readings: ${run.run} ${batch.readingCount} readings, ${batch.quietCount} Quiet, ${batch.closeCount} Close, ${batch.overCount} Over`);
      inserted += 1;
    }
    return inserted;
  },
};
