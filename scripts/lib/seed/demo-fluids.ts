import { inArray } from 'drizzle-orm';
import { readFluidInput } from '../../../shared/fluids/read-fluid-input';
import { waterDensity } from '../../../shared/physics/properties/water-density';
import { waterSurfaceTension } from '../../../shared/physics/properties/water-surface-tension';
import { waterSurfaceTensionSlope } from '../../../shared/physics/properties/water-surface-tension-slope';
import { waterViscosity } from '../../../shared/physics/properties/water-viscosity';
import { fluidInputSchema, type FluidInput } from '../../../shared/schemas/fluids';
import { formatSignificant } from '../../../shared/units/format-significant';
import { fluids } from '../../../server/db/schema/fluids';
import { recordAuditEvent } from '../../../server/features/audit/record-audit-event';
import { fluidColumns, toFluid } from '../../../server/features/fluids/fluid-records';
import type { SeedStep } from './seed-step';

const C = 273.15;
const IAPWS_SIGMA = 'IAPWS R1-76(2014) Revised Release on Surface Tension of Ordinary Water Substance (formulation evaluated at 20 °C)';
const IAPWS_MU = 'IAPWS R12-08 (2008) Formulation for the Viscosity of Ordinary Water Substance, at 0.1 MPa (formulation evaluated; density from Kell 1975)';
const KELL = 'Kell G.S. (1975) Density, thermal expansivity and compressibility of liquid water from 0 to 150 °C, J. Chem. Eng. Data 20:97 (formulation evaluated; β by central difference ±0.5 K)';
const ADAMSON = 'Adamson A.W., Gast A.P. (1997) Physical Chemistry of Surfaces, 6th ed., surface-tension table (read second-hand)';
const FROM_MEMORY = 'handbook value, from memory — verify against a primary table before relying on it';

/** Water at 20 °C from the IAPWS formulations coded in shared/physics/properties. */
function waterInput(): FluidInput {
  const t20 = 20 + C;
  const rho = waterDensity(t20);
  const beta = -(waterDensity(t20 + 0.5) - waterDensity(t20 - 0.5)) / rho;
  const sig = (x: number, digits = 5) => formatSignificant(x, digits);
  return {
    name: 'Water',
    kind: 'other',
    notes: 'Pure liquid water at atmospheric pressure. Every value comes from the IAPWS/Kell formulations.',
    referenceTemperature: '20 °C',
    validFrom: '5 °C',
    validTo: '70 °C',
    density: { value: `${sig(rho, 6)} kg/m³`, source: KELL, uncertaintyPercent: 0.01 },
    expansion: { value: `${sig(beta, 4)} 1/K`, source: KELL, uncertaintyPercent: 1 },
    viscosity: {
      law: 'points',
      points: [10, 20, 30, 40, 50, 60].map((c) => ({ temperature: `${c} °C`, value: `${sig(waterViscosity(c + C) * 1e3)} mPa·s` })),
      source: IAPWS_MU,
      uncertaintyPercent: 1,
    },
    surfaceTension: { value: `${sig(waterSurfaceTension(t20) * 1e3)} mN/m`, source: IAPWS_SIGMA, uncertaintyPercent: 0.5 },
    surfaceTensionSlope: {
      value: `${sig(waterSurfaceTensionSlope(t20) * 1e3, 4)} mN/(m·K)`,
      source: `${IAPWS_SIGMA}; slope dσ/dT of the formulation at 20 °C`,
      uncertaintyPercent: 2,
    },
    conductivity: {
      value: '0.598 W/(m·K)',
      source: `IAPWS R15-11 (2011) thermal conductivity of water, 20 °C, 0.1 MPa — ${FROM_MEMORY}`,
      uncertaintyPercent: 1,
    },
    heatCapacity: { value: '4182 J/(kg·K)', source: `IAPWS-95 isobaric heat capacity at 20 °C — ${FROM_MEMORY}`, uncertaintyPercent: 0.5 },
  };
}

/**
 * The demo library of the invented company Larkspur Coatings. Real fluids carry real property
 * values with their sources; values recalled without a retrieved source say "from memory"; the
 * primer blend is INVENTED. No brand's datasheet is used.
 */
export function demoFluidInputs(): FluidInput[] {
  return [
    waterInput(),
    {
      name: 'Ethanol',
      kind: 'solvent',
      notes: 'Anhydrous ethanol. Flammable: keep oven exhaust well below the lower flammable limit.',
      referenceTemperature: '20 °C',
      validFrom: '0 °C',
      validTo: '70 °C',
      density: { value: '789.3 kg/m³', source: `CRC Handbook of Chemistry and Physics — ${FROM_MEMORY}`, uncertaintyPercent: 0.2 },
      expansion: { value: '0.00109 1/K', source: `CRC Handbook of Chemistry and Physics — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
      viscosity: {
        law: 'points',
        points: [
          { temperature: '20 °C', value: '1.20 mPa·s' },
          { temperature: '40 °C', value: '0.83 mPa·s' },
        ],
        source: `CRC Handbook of Chemistry and Physics, viscosity of liquids — ${FROM_MEMORY}`,
        uncertaintyPercent: 3,
      },
      surfaceTension: { value: '22.39 mN/m', source: `${ADAMSON}: 22.39 mN/m at 20 °C`, uncertaintyPercent: 1 },
      surfaceTensionSlope: {
        value: '-0.084 mN/(m·K)',
        source: `derived from ${ADAMSON}: 22.39 mN/m at 20 °C and 21.55 mN/m at 30 °C`,
        uncertaintyPercent: 5,
      },
      conductivity: { value: '0.167 W/(m·K)', source: `CRC Handbook, thermal conductivity of liquids — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
      heatCapacity: { value: '2.44 kJ/(kg·K)', source: `CRC Handbook, heat capacity of liquids — ${FROM_MEMORY}`, uncertaintyPercent: 3 },
    },
    {
      name: 'Toluene',
      kind: 'solvent',
      notes: 'Aromatic coating solvent. Flammable; a reproductive toxicant under EU rules — closed handling.',
      referenceTemperature: '20 °C',
      validFrom: '0 °C',
      validTo: '100 °C',
      density: { value: '866.9 kg/m³', source: `CRC Handbook of Chemistry and Physics — ${FROM_MEMORY}`, uncertaintyPercent: 0.2 },
      expansion: { value: '0.00107 1/K', source: `CRC Handbook of Chemistry and Physics — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
      viscosity: {
        law: 'points',
        points: [
          { temperature: '20 °C', value: '0.59 mPa·s' },
          { temperature: '50 °C', value: '0.42 mPa·s' },
        ],
        source: `CRC Handbook of Chemistry and Physics, viscosity of liquids — ${FROM_MEMORY}`,
        uncertaintyPercent: 3,
      },
      surfaceTension: { value: '28.52 mN/m', source: `${ADAMSON}: 28.52 mN/m at 20 °C`, uncertaintyPercent: 1 },
      surfaceTensionSlope: {
        value: '-0.119 mN/(m·K)',
        source: `Jasper J.J. (1972) The surface tension of pure liquid compounds, J. Phys. Chem. Ref. Data 1:841 — ${FROM_MEMORY}`,
        uncertaintyPercent: 5,
      },
      conductivity: { value: '0.131 W/(m·K)', source: `CRC Handbook, thermal conductivity of liquids — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
      heatCapacity: { value: '1.70 kJ/(kg·K)', source: `CRC Handbook, heat capacity of liquids — ${FROM_MEMORY}`, uncertaintyPercent: 3 },
    },
    ...(
      [
        { cSt: '10', rho: '935', sigma: '20.1', k: '0.134', beta: '0.00108' },
        { cSt: '100', rho: '965', sigma: '20.9', k: '0.155', beta: '0.00096' },
        { cSt: '1000', rho: '970', sigma: '21.2', k: '0.158', beta: '0.00096' },
      ] as const
    ).map(
      (oil): FluidInput => ({
        name: `Silicone oil ${oil.cSt} cSt`,
        kind: 'oil',
        notes:
          'Polydimethylsiloxane of nominal kinematic viscosity at 25 °C. Silicone oils of 0.65–100 cSt were used in the ' +
          'surface-tension-driven convection experiments of Koschmieder E.L., Prahl S.A. (1990) J. Fluid Mech. 215:571–583; ' +
          'the property values here are generic handbook values, not theirs.',
        referenceTemperature: '25 °C',
        validFrom: '0 °C',
        validTo: '100 °C',
        density: { value: `${oil.rho} kg/m³`, source: `generic polydimethylsiloxane handbook value at 25 °C — ${FROM_MEMORY}`, uncertaintyPercent: 1 },
        expansion: { value: `${oil.beta} 1/K`, source: `generic polydimethylsiloxane handbook value — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
        viscosity: {
          law: 'points',
          points: [{ temperature: '25 °C', value: `${oil.cSt} cSt` }],
          source: `nominal grade (kinematic viscosity at 25 °C), converted with the density; temperature dependence not entered — ${FROM_MEMORY}`,
          uncertaintyPercent: 5,
        },
        surfaceTension: { value: `${oil.sigma} mN/m`, source: `generic polydimethylsiloxane handbook value at 25 °C — ${FROM_MEMORY}`, uncertaintyPercent: 3 },
        surfaceTensionSlope: {
          value: '-0.06 mN/(m·K)',
          source: `typical of polydimethylsiloxanes — ${FROM_MEMORY}`,
          uncertaintyPercent: 15,
        },
        conductivity: { value: `${oil.k} W/(m·K)`, source: `generic polydimethylsiloxane handbook value — ${FROM_MEMORY}`, uncertaintyPercent: 5 },
        heatCapacity: { value: '1.5 kJ/(kg·K)', source: `generic polydimethylsiloxane handbook value — ${FROM_MEMORY}`, uncertaintyPercent: 10 },
      }),
    ),
    {
      name: 'Primer solvent blend PB-7 (invented)',
      kind: 'solution',
      notes:
        'INVENTED for the Larkspur Coatings demo (Line 2 primer): a resin solution in a fast/slow solvent blend. ' +
        'Values are made up to be plausible (DOMAIN.md §3 example film) and must not be used for a real process.',
      referenceTemperature: '25 °C',
      validFrom: '15 °C',
      validTo: '80 °C',
      density: { value: '1.02 g/cm³', source: 'INVENTED demo value', uncertaintyPercent: 2 },
      expansion: { value: '0.0009 1/K', source: 'INVENTED demo value', uncertaintyPercent: 10 },
      viscosity: {
        law: 'points',
        points: [
          { temperature: '25 °C', value: '40 cP' },
          { temperature: '60 °C', value: '12 cP' },
        ],
        source: 'INVENTED demo value',
        uncertaintyPercent: 10,
      },
      surfaceTension: { value: '30 dyn/cm', source: 'INVENTED demo value', uncertaintyPercent: 5 },
      surfaceTensionSlope: { value: '-0.09 mN/(m·K)', source: 'INVENTED demo value', uncertaintyPercent: 20 },
      conductivity: { value: '0.15 W/(m·K)', source: 'INVENTED demo value', uncertaintyPercent: 10 },
      thermalDiffusivity: { value: '1e-7 m²/s', source: 'INVENTED demo value', uncertaintyPercent: 10 },
      soluteDiffusivity: { value: '1e-10 m²/s', source: 'INVENTED demo value', uncertaintyPercent: 30 },
      soluteSurfaceTensionSlope: { value: '-15 mN/m', source: 'INVENTED demo value: σ falls as the solvent fraction rises (the solvent σ is below the resin σ)', uncertaintyPercent: 30 },
    },
    {
      name: 'Low-sulfur steel melt',
      kind: 'molten-metal',
      notes:
        'Liquid iron with negligible sulfur activity, for the weld-cell melt-pool demo. dσ/dT < 0: outward surface flow and a shallow, wide pool. ' +
        'Sulfur above about 30–70 ppm reverses the sign (Mills et al. 1998; Heiple & Roper 1982).',
      referenceTemperature: '1809 K',
      validFrom: '1809 K',
      validTo: '2500 K',
      density: { value: '7000 kg/m³', source: `liquid steel; order of value used in DebRoy T., David S.A. (1995) Rev. Mod. Phys. 67:85 — ${FROM_MEMORY}`, uncertaintyPercent: 3 },
      expansion: { value: '0.0001 1/K', source: `liquid iron — ${FROM_MEMORY}`, uncertaintyPercent: 30 },
      viscosity: {
        law: 'points',
        points: [{ temperature: '1809 K', value: '6 mPa·s' }],
        source: `liquid steel — ${FROM_MEMORY} (DOMAIN notes: ~6 mPa·s; check DebRoy & David 1995)`,
        uncertaintyPercent: 30,
      },
      surfaceTension: {
        value: '1.943 N/m',
        source: 'Sahoo P., DebRoy T., McNallan M.J. (1988) Surface tension of binary metal–surface active solute systems under conditions relevant to welding metallurgy, Metall. Trans. B 19:483–491: γ_m° of pure iron at T_m = 1809 K',
        uncertaintyPercent: 3,
      },
      surfaceTensionSlope: {
        value: '-0.43 mN/(m·K)',
        source: 'Sahoo, DebRoy & McNallan (1988) Metall. Trans. B 19:483: A = 4.3×10⁻⁴ N/(m·K) for Fe–S, sulfur activity → 0',
        uncertaintyPercent: 10,
      },
      conductivity: { value: '30 W/(m·K)', source: `liquid steel — ${FROM_MEMORY}; verify against DebRoy & David (1995)`, uncertaintyPercent: 20 },
      heatCapacity: { value: '750 J/(kg·K)', source: `liquid steel — ${FROM_MEMORY}; verify against DebRoy & David (1995)`, uncertaintyPercent: 15 },
    },
  ];
}

/** Inserts the demo fluids that are not in the library yet (matched by name); never updates. */
export const seedDemoFluids: SeedStep = {
  name: 'demo fluids',
  async run({ db }) {
    const inputs = demoFluidInputs();
    const existing = await db.select({ name: fluids.name }).from(fluids).where(inArray(fluids.name, inputs.map((i) => i.name)));
    const have = new Set(existing.map((r) => r.name));
    let inserted = 0;
    for (const input of inputs.filter((i) => !have.has(i.name))) {
      const read = readFluidInput(fluidInputSchema.parse(input));
      if (!read.ok) throw new Error(`demo fluid ${input.name} is not valid: ${JSON.stringify(read.fields)}`);
      await db.transaction(async (tx) => {
        const [row] = await tx.insert(fluids).values(fluidColumns(read.fluid)).returning();
        await recordAuditEvent(tx, { actor: null, action: 'fluid.seeded', entityType: 'fluid', entityId: row.id, after: toFluid(row, 0), reason: 'demo seed' });
      });
      inserted += 1;
    }
    return inserted;
  },
};
