import { eq, sql } from 'drizzle-orm';
import { demoLine2DryingInput } from '../../../shared/physics/drying/demo-line-2';
import { LARKSPUR_WELD_CELL_DEMO } from '../../../shared/physics/melt-pool/larkspur-weld-cell-demo';
import { dryingPathInputSchema } from '../../../shared/schemas/drying-paths';
import { layerCheckInputSchema, type LayerCheckInput } from '../../../shared/schemas/layer-checks';
import { meltPoolInputSchema } from '../../../shared/schemas/melt-pool';
import type { CurrentUser } from '../../../server/auth/current-user';
import type { Database } from '../../../server/db/client';
import { dryingSetups, heats, meltPoolSetups } from '../../../server/db/schema/beyond-onset';
import { saveDryingSetup } from '../../../server/features/drying-paths/drying-paths.service';
import { createLayerCheck } from '../../../server/features/layer-checks/layer-checks.service';
import { saveMeltPoolSetup } from '../../../server/features/melt-pool/melt-pool.service';
import { DEMO_ENGINEER, demoFluidId, demoUser, seededCheckId } from './demo-people';
import type { SeedStep } from './seed-step';

/**
 * The layer checks of the invented company Larkspur Coatings. Every company, line, product and
 * setting below is INVENTED; fluid properties come from the demo fluid library (demo-fluids.ts,
 * with their sources). Each check is created through the layer-check service, so it has its
 * revision 1, stored margin and regime and an audit entry like a check the engineer saved.
 */
export const DEMO_CHECK_TITLES = Object.freeze({
  line2Zone1: 'Line 2 primer — zone 1 at 60 °C',
  line2Repair: 'Line 2 primer — thick repair coat',
  casterB: 'Caster B — dope on the belt',
  siliconeCalibration: 'Silicone-oil calibration layer',
  weldRoot: 'Weld cell — 316L orbital root',
});

const PRIMER = 'Primer solvent blend PB-7 (invented)';
const ETHANOL = 'Ethanol';
const SILICONE_100 = 'Silicone oil 100 cSt';
const STEEL = 'Low-sulfur steel melt';

/**
 * Latent heat of the PR-2 thinner: 38.0 kJ/mol at 298 K (NIST Chemistry WebBook, toluene) over
 * 92.141 g/mol = 412.4 kJ/kg — the value shared/physics/drying/demo-line-2.ts uses.
 */
const PR2_LATENT_HEAT = '412 kJ/kg';
/** Ethanol: 42.3 kJ/mol near 25 °C over 46.07 g/mol ≈ 918 kJ/kg (NIST Chemistry WebBook; from memory — verify). */
const ETHANOL_LATENT_HEAT = '918 kJ/kg';

type DemoCheck = Omit<LayerCheckInput, 'fluidId'> & { title: string; fluidName: string };

/**
 * The five demo checks. Margins (solver as committed) are given as what to expect, not as test
 * values: zone 1 Quiet (≈ 1.7, long-wave thinning below ≈ 39 µm), repair coat Over (surface-tension
 * cells), Caster B Close, silicone oil Close to its onset, weld root Over (a melt pool stirs).
 */
export function demoCheckInputs(): DemoCheck[] {
  return [
    {
      title: DEMO_CHECK_TITLES.line2Zone1,
      fluidName: PRIMER,
      processKind: 'drying-coat',
      notes:
        'INVENTED demo (Larkspur Coatings Line 2): primer PR-2, 50 µm wet on PET web in zone 1 of the three-zone oven, air at 60 °C. ' +
        'Evaporation of the thinner (0.8 g/(m²·s), INVENTED but of the order a 40–50 µm coat loses over the 32 s in the oven) cools the surface, ' +
        'so the film is heated from below. On this deformable surface the first failure is long-wave thinning into dry spots when the coat runs thin; ' +
        'cells need a far thicker coat. Hot oven and flammable solvent vapour: keep the exhaust below 25 % of the lower flammable limit (NFPA 86) and follow local codes.',
      temperature: '60 °C',
      depth: '50 µm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'evaporation', evaporationRate: '0.0008 kg/(m²·s)', latentHeat: PR2_LATENT_HEAT, heatTransferCoefficient: '40 W/(m²·K)' },
      panelWidth: '1.2 m',
    },
    {
      title: DEMO_CHECK_TITLES.line2Repair,
      fluidName: PRIMER,
      processKind: 'drying-coat',
      notes:
        'INVENTED demo, deliberately over the line: a 300 µm brushed repair coat of primer PR-2 on a panel that came straight out of zone 3 at 120 °C, ' +
        'drying in 60 °C air. Expect surface-tension cells (orange peel, picture framing at the panel edges); thin the coat or let the panel cool first. ' +
        'Hot surfaces and solvent vapour: gloves, ventilation, no ignition sources.',
      temperature: '60 °C',
      depth: '300 µm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'substrate-air', substrateTemperature: '120 °C', airTemperature: '60 °C', heatTransferCoefficient: '40 W/(m²·K)' },
      panelWidth: '0.5 m',
    },
    {
      title: DEMO_CHECK_TITLES.casterB,
      fluidName: ETHANOL,
      processKind: 'cast-film',
      notes:
        'INVENTED demo (Larkspur Coatings Caster B): a 150 µm ethanol-borne dope on the steel belt at 35 °C, first drying section. ' +
        'Screening check with the properties of the solvent alone — the thin, low-viscosity limit of the dope, so the margin is on the safe side. ' +
        'Evaporation 0.5 g/(m²·s) (INVENTED). Flammable vapour: follow local codes for solvent casting.',
      temperature: '35 °C',
      depth: '150 µm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'evaporation', evaporationRate: '0.0005 kg/(m²·s)', latentHeat: ETHANOL_LATENT_HEAT, heatTransferCoefficient: '25 W/(m²·K)' },
      panelWidth: '1.4 m',
    },
    {
      title: DEMO_CHECK_TITLES.siliconeCalibration,
      fluidName: SILICONE_100,
      processKind: 'general-layer',
      notes:
        'Calibration layer: 3 mm of 100 cSt silicone oil on a conducting plate, free flat surface, heated from below by 3.5 K. ' +
        'The solver should show the textbook critical values for this case: Ma = 79.61 without buoyancy (Pearson J.R.A. 1958, J. Fluid Mech. 4:489, ' +
        'insulating surface, Bi = 0) and Ra = 669.0 without surface tension (Nield D.A. 1964, J. Fluid Mech. 19:341, rigid conducting bottom, free insulating top). ' +
        'Layers like this, of silicone oils, were used by Koschmieder E.L., Prahl S.A. (1990) J. Fluid Mech. 215:571.',
      temperature: '25 °C',
      depth: '3 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      deformableSurface: false,
      heating: { mode: 'deltaT', deltaT: '3.5 K' },
    },
    {
      title: DEMO_CHECK_TITLES.weldRoot,
      fluidName: STEEL,
      processKind: 'melt-pool',
      notes:
        `INVENTED demo (${LARKSPUR_WELD_CELL_DEMO.cell}): root pass of a 316L orbital tube weld, about 1.5 mm of melt, ` +
        'represented by the low-sulfur steel melt. A melt pool always stirs; what matters is the direction of the surface flow (see the melt-pool set-up and the two heats). ' +
        'Welding: arc radiation, fume and hot metal — qualified welders and procedures, local codes.',
      temperature: '1900 K',
      depth: '1.5 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      heating: { mode: 'deltaT', deltaT: '5 K' },
    },
  ];
}

/** Line 2 at 30 m/min (demo-line-2.ts), with the zone-1 check's 50 µm wet coat. */
async function attachLine2Drying(db: Database, engineer: CurrentUser, checkId: string): Promise<number> {
  const [setup] = await db.select({ id: dryingSetups.id }).from(dryingSetups).where(eq(dryingSetups.checkId, checkId)).limit(1);
  if (setup) return 0;
  const input = dryingPathInputSchema.parse({ ...demoLine2DryingInput(), wetThickness: 50e-6 });
  await saveDryingSetup(db, engineer, checkId, { title: 'Line 2 at 30 m/min, three zones, 50 µm wet (demo)', input });
  return 1;
}

/** The demo pool (larkspur-weld-cell-demo.ts) joining the two demo heats, when both are in the register. */
async function attachWeldPool(db: Database, engineer: CurrentUser, checkId: string): Promise<number> {
  const [setup] = await db.select({ id: meltPoolSetups.id }).from(meltPoolSetups).where(eq(meltPoolSetups.checkId, checkId)).limit(1);
  if (setup) return 0;
  const ids: string[] = [];
  for (const heat of LARKSPUR_WELD_CELL_DEMO.heats) {
    const [row] = await db.select({ id: heats.id }).from(heats).where(sql`lower(${heats.heatNumber}) = lower(${heat.heatNumber})`).limit(1);
    if (!row) return 0;
    ids.push(row.id);
  }
  const demo = LARKSPUR_WELD_CELL_DEMO.check;
  const input = meltPoolInputSchema.parse({
    sulfur: `${LARKSPUR_WELD_CELL_DEMO.heats[0].sulfurWtPercent} wt %`,
    edgeTemperature: demo.edgeTemperature,
    peakTemperature: demo.peakTemperature,
    halfWidth: demo.halfWidth,
    density: demo.density,
    viscosity: demo.viscosity,
    thermalDiffusivity: demo.thermalDiffusivity,
  });
  await saveMeltPoolSetup(db, engineer, checkId, { input, firstHeatId: ids[0], secondHeatId: ids[1] });
  return 1;
}

/**
 * Creates the demo checks that are missing (natural key: the revision-1 title), owned by the demo
 * engineer, with the Line 2 Drying path and the weld-cell melt-pool set-up. Never updates a check.
 */
export const seedDemoChecks: SeedStep = {
  name: 'demo layer checks',
  async run({ db, log }) {
    const engineer = await demoUser(db, DEMO_ENGINEER);
    if (!engineer) return 0;
    let inserted = 0;
    for (const { fluidName, ...check } of demoCheckInputs()) {
      if (await seededCheckId(db, check.title)) continue;
      const fluidId = await demoFluidId(db, fluidName);
      if (!fluidId) {
        log(`demo layer checks: fluid "${fluidName}" is not in the library; "${check.title}" skipped`);
        continue;
      }
      const checkId = (await createLayerCheck(db, engineer, layerCheckInputSchema.parse({ ...check, fluidId }))).id;
      inserted += 1;
      // Set-ups only with a check made now: one that people deleted later is not brought back.
      if (check.title === DEMO_CHECK_TITLES.line2Zone1) inserted += await attachLine2Drying(db, engineer, checkId);
      if (check.title === DEMO_CHECK_TITLES.weldRoot) inserted += await attachWeldPool(db, engineer, checkId);
    }
    return inserted;
  },
};
