import { and, eq, sql } from 'drizzle-orm';
import { demoLine2DryingInput } from '../../../shared/physics/drying/demo-line-2';
import { LARKSPUR_WELD_CELL_DEMO } from '../../../shared/physics/melt-pool/larkspur-weld-cell-demo';
import { dryingPathInputSchema } from '../../../shared/schemas/drying-paths';
import { layerCheckInputSchema, type LayerCheckInput } from '../../../shared/schemas/layer-checks';
import { meltPoolInputSchema } from '../../../shared/schemas/melt-pool';
import type { Database } from '../../../server/db/client';
import { dryingSetups, heats, meltPoolSetups } from '../../../server/db/schema/beyond-onset';
import { fluids } from '../../../server/db/schema/fluids';
import { layerChecks } from '../../../server/db/schema/layer-checks';
import { users } from '../../../server/db/schema/users';
import { saveDryingSetup } from '../../../server/features/drying-paths/drying-paths.service';
import { createLayerCheck } from '../../../server/features/layer-checks/layer-checks.service';
import { createHeat } from '../../../server/features/melt-pool/heats.service';
import { saveMeltPoolSetup } from '../../../server/features/melt-pool/melt-pool.service';
import type { SeedStep } from './seed-step';

const ENGINEER = 'engineer@larkspur.example';
const LINE_2_CHECK = 'Line 2 primer PR-2, Drying path demo (invented)';

async function demoEngineer(db: Database) {
  const [row] = await db.select({ id: users.id, email: users.email, displayName: users.displayName, role: users.role }).from(users).where(eq(users.email, ENGINEER)).limit(1);
  return row;
}

async function fluidId(db: Database, name: string): Promise<string | undefined> {
  const [row] = await db.select({ id: fluids.id }).from(fluids).where(eq(fluids.name, name)).limit(1);
  return row?.id;
}

/** The check with this title, created by the demo engineer when missing (INVENTED demo data). */
async function findOrCreateCheck(db: Database, engineer: NonNullable<Awaited<ReturnType<typeof demoEngineer>>>, input: LayerCheckInput): Promise<{ id: string; created: boolean }> {
  const [existing] = await db.select({ id: layerChecks.id }).from(layerChecks).where(eq(layerChecks.title, input.title)).limit(1);
  if (existing) return { id: existing.id, created: false };
  const check = await createLayerCheck(db, engineer, layerCheckInputSchema.parse(input));
  return { id: check.id, created: true };
}

/**
 * Larkspur Coatings Line 2 (INVENTED): a drying-coat check for primer PR-2 and its Drying path set-up
 * (three-zone oven at 30 m/min; shared/physics/drying/demo-line-2.ts has the values and sources).
 */
export const seedDemoLine2Drying: SeedStep = {
  name: 'demo Line 2 drying set-up',
  async run({ db }) {
    const engineer = await demoEngineer(db);
    const primer = await fluidId(db, 'Primer solvent blend PB-7 (invented)');
    if (!engineer || !primer) return 0;
    const check = await findOrCreateCheck(db, engineer, {
      title: LINE_2_CHECK,
      fluidId: primer,
      processKind: 'drying-coat',
      notes: 'INVENTED demo: Larkspur Coatings Line 2 primer at the oven entry, 40 µm wet.',
      temperature: '25 °C',
      depth: '40 µm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'substrate-air', substrateTemperature: '25 °C', airTemperature: '60 °C', heatTransferCoefficient: '40 W/(m²·K)' },
      soluteFractionDifference: 0.02,
    });
    const [setup] = await db.select({ id: dryingSetups.id }).from(dryingSetups).where(eq(dryingSetups.checkId, check.id)).limit(1);
    if (setup) return check.created ? 1 : 0;
    await saveDryingSetup(db, engineer, check.id, { title: 'Line 2 at 30 m/min, three zones (demo)', input: dryingPathInputSchema.parse(demoLine2DryingInput()) });
    return check.created ? 2 : 1;
  },
};

/**
 * The weld cell (INVENTED): the two demo heats in the register (their sulfur straddles the 30–70 ppm
 * band) and a melt-pool check with the two heats linked to the demo pool.
 */
export const seedDemoWeldCellHeats: SeedStep = {
  name: 'demo weld-cell heats',
  async run({ db }) {
    const engineer = await demoEngineer(db);
    if (!engineer) return 0;
    let inserted = 0;
    const ids: string[] = [];
    for (const heat of LARKSPUR_WELD_CELL_DEMO.heats) {
      const [existing] = await db.select({ id: heats.id }).from(heats).where(sql`lower(${heats.heatNumber}) = lower(${heat.heatNumber})`).limit(1);
      if (existing) {
        ids.push(existing.id);
        continue;
      }
      const created = await createHeat(db, engineer, {
        heatNumber: heat.heatNumber,
        supplier: heat.supplier,
        product: heat.product,
        sulfur: `${heat.sulfurWtPercent} wt %`,
        oxygen: `${heat.oxygenWtPercent} wt %`,
        notes: 'INVENTED demo heat (Larkspur Coatings weld cell).',
      });
      ids.push(created.id);
      inserted += 1;
    }
    const steel = await fluidId(db, 'Low-sulfur steel melt');
    if (!steel) return inserted;
    const demo = LARKSPUR_WELD_CELL_DEMO.check;
    const check = await findOrCreateCheck(db, engineer, {
      title: demo.title,
      fluidId: steel,
      processKind: 'melt-pool',
      notes: `INVENTED demo: ${LARKSPUR_WELD_CELL_DEMO.cell}.`,
      temperature: `${demo.edgeTemperature + 50} K`,
      depth: '1 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'deltaT', deltaT: '5 K' },
    });
    if (check.created) inserted += 1;
    const [setup] = await db.select({ id: meltPoolSetups.id }).from(meltPoolSetups).where(and(eq(meltPoolSetups.checkId, check.id))).limit(1);
    if (!setup) {
      const input = meltPoolInputSchema.parse({
        sulfur: `${LARKSPUR_WELD_CELL_DEMO.heats[0].sulfurWtPercent} wt %`,
        edgeTemperature: demo.edgeTemperature,
        peakTemperature: demo.peakTemperature,
        halfWidth: demo.halfWidth,
        density: demo.density,
        viscosity: demo.viscosity,
        thermalDiffusivity: demo.thermalDiffusivity,
      });
      await saveMeltPoolSetup(db, engineer, check.id, { input, firstHeatId: ids[0], secondHeatId: ids[1] });
      inserted += 1;
    }
    return inserted;
  },
};
