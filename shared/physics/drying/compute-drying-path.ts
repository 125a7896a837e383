import { denseOutputAt, integrateAdaptive } from '../ode';
import type { DenseSegment } from '../ode';
import { createCriticalMarangoniTable } from './create-critical-marangoni-table';
import { evaluateFilmPoint } from './evaluate-film-point';
import type { FilmPoint, MarginTables } from './film-point';
import { dryingRates } from './drying-rates';
import { filmViscosity } from './film-viscosity';
import { prepareDryingPath } from './prepare-drying-path';
import type { PreparedDryingPath, PreparedZone } from './prepared-drying-path';
import { solventVentilationCaution } from './solvent-ventilation-caution';
import type {
  DryingEvent,
  DryingPathInput,
  DryingPathResult,
  DryingSeries,
  DryingVerdict,
  DryingZoneSummary,
} from './types';

/** Growth by at least one e-fold before the film freezes counts as a pattern (derived criterion). */
const PATTERN_E_FOLDS = 1;
/** Decay by three e-folds (to 5 %) after the margin recovers counts as levelled out (derived criterion). */
const DECAYED_E_FOLDS = 3;
/** Stand-in for an infinite margin while locating a crossing of margin = 1. */
const MARGIN_CAP = 1e6;
const REFINE_ITERATIONS = 40;

interface ZoneRun {
  zone: PreparedZone;
  dense: DenseSegment[];
  times: number[];
  points: FilmPoint[];
}

function fmt(x: number): string {
  if (!Number.isFinite(x)) return x > 0 ? '∞' : String(x);
  return Number(x.toPrecision(3)).toString();
}

/** Times of the plotting grid in one zone: start and end plus evenly spaced interior points. */
function zoneGrid(zone: PreparedZone, totalTime: number, gridPoints: number): number[] {
  const n = Math.max(2, Math.round((gridPoints * zone.duration) / totalTime));
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? zone.endTime : zone.startTime + (zone.duration * i) / (n - 1)));
}

/** Crossing of margin = 1 between two times on one zone's dense output (Illinois regula falsi). */
function refineCrossing(
  path: PreparedDryingPath,
  run: ZoneRun,
  tables: MarginTables,
  drive: 'solutal' | 'thermal',
  ta: number,
  tb: number,
): number {
  const g = (t: number): number => {
    const p = evaluateFilmPoint(path, run.zone, denseOutputAt(run.dense, t), tables);
    const m = drive === 'solutal' ? p.solutalMargin : p.thermalMargin;
    return Math.min(m, MARGIN_CAP) - 1;
  };
  let ga = g(ta);
  let gb = g(tb);
  if (Math.sign(ga) === Math.sign(gb)) return tb;
  let side = 0;
  for (let k = 0; k < REFINE_ITERATIONS && tb - ta > 1e-9 * Math.max(1, tb); k++) {
    const guess = (ta * gb - tb * ga) / (gb - ga);
    const t = Number.isFinite(guess) && guess > ta && guess < tb ? guess : 0.5 * (ta + tb);
    const gt = g(t);
    if (gt === 0) return t;
    if (Math.sign(gt) === Math.sign(ga)) {
      ta = t;
      ga = gt;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      tb = t;
      gb = gt;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  return tb;
}

/**
 * Drying path of a single-solvent coating through a zoned oven: thickness, solids, viscosity and
 * film temperature against time and oven position, the temperature and solvent-content differences
 * across the film, Ra, thermal and solutal Marangoni numbers, both Onset margins and the regime; when
 * cells can start, when the film freezes, whether a cell pattern is expected in the dry film; per-zone
 * solvent loads with a ventilation caution; and a mass-balance check of the dry thickness.
 *
 * ## Method
 * Model and assumptions (each documented where it is used):
 * - State [h, φ, T_f] integrated zone by zone (zone boundaries are integration end points, as the air
 *   temperature and transfer coefficients jump there) with the Dormand–Prince 5(4) integrator
 *   (rtol default 1e-8), right-hand side {@link dryingRates}: single solvent, volumes additive, solids
 *   conserved, activity ≈ solvent volume fraction, gas-side and in-film diffusion resistances in series
 *   (Crank's L), film and substrate lumped at one temperature, constant latent heat and film properties.
 * - Points on the plotting grid (and crossings) from {@link evaluateFilmPoint}: ΔT = q h/k, Δc = ṁh/(ρ_s D),
 *   groups and margins (thermal: conducting bottom; solutal: impermeable bottom, mass Biot L).
 * - Cells can start where a margin first falls below 1 (located on the dense output to ~1e-9 relative).
 * - The film freezes when μ ≥ freezeViscosity (default 10³ Pa·s) or φ ≥ freezeSolidsFraction (default φ_m
 *   for Krieger–Dougherty), located as integrator events.
 * - Growth and decay (derived criterion, not a published one): with the growth-rate scale
 *   s = (χ/h²)(1/λ − 1) of {@link evaluateFilmPoint}, N_grow = ∫ s dt while s > 0 and N_decay = ∫ |s| dt
 *   after the last return to quiet, both up to the freeze (or the oven exit), trapezoid rule on the grid.
 *   N_grow < 1 or N_decay ≥ 3 → the cells die out; otherwise, still unstable at the freeze or
 *   N_decay < 1 → pattern expected; 1 ≤ N_decay < 3 → pattern possible.
 * - Mass balance: h·φ at the exit against h₀·φ₀ (DFT = WFT × volume solids) — agrees to the integrator
 *   tolerance because the integrator carries h and φ separately.
 * - Per zone (line transport with a web width): solvent kg/s and L/min across the web, and fresh air for
 *   ≤ 25 % LFL (50 % with continuous monitoring) as a caution ({@link solventVentilationCaution}).
 *
 * ## References
 * - Dormand J.R., Prince P.J. (1980) J. Comput. Appl. Math. 6:19–26. doi:10.1016/0771-050X(80)90013-3
 * - Crank J. (1975) "The Mathematics of Diffusion", 2nd ed., Oxford, §4.3.
 * - Krieger I.M., Dougherty T.J. (1959) Trans. Soc. Rheol. 3:137–152. doi:10.1122/1.548848
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500; Nield D.A. (1964) J. Fluid Mech. 19:341–352.
 * - Tönsmann M., Scharfer P., Schabel W. (2021) Polymers 13(17):2955 (solutal cells in drying films).
 * - NFPA 86, Standard for Ovens and Furnaces; EN 1539:2015.
 *
 * @param input - the Drying path input, SI units (see DryingPathInput)
 * @returns series on the plotting grid, events, zone summaries, onset verdict, mass balance, warnings
 *   and integrator counters; throws RangeError naming the field for bad input
 * @example computeDryingPath(demoLine2DryingInput()).onset.verdict
 * // 'pattern-expected' (solutal cells from the start; the film freezes at ≈ 10.9 s, 5.46 m in)
 */
export function computeDryingPath(input: DryingPathInput): DryingPathResult {
  const path = prepareDryingPath(input);
  const tables: MarginTables = {
    thermal: createCriticalMarangoniTable('conducting'),
    solutal: createCriticalMarangoniTable('insulating'),
  };
  const sub = input.substrate;
  let y = [input.wetThickness, input.solidsFraction, sub.kind === 'held' ? sub.temperature : sub.initialTemperature];
  const stats = { accepted: 0, rejected: 0, evaluations: 0 };
  const runs: ZoneRun[] = [];
  let frozenAt: number | null = null;
  let frozenBy: 'viscosity' | 'solids' | null = null;
  const atol = [Math.max(1e-15, input.wetThickness * 1e-10), 1e-10, 1e-7];

  for (const zone of path.zones) {
    const times = zoneGrid(zone, path.totalTime, path.gridPoints);
    const events = [
      {
        name: 'viscosity',
        direction: 'rising' as const,
        g: (_t: number, s: readonly number[]) => {
          const mu = filmViscosity(input.viscosity, Math.min(1, Math.max(0, s[1])), s[2]);
          return Number.isFinite(mu) ? Math.log(mu / path.freezeViscosity) : MARGIN_CAP;
        },
      },
      ...(path.freezeSolidsFraction === null
        ? []
        : [{ name: 'solids', direction: 'rising' as const, g: (_t: number, s: readonly number[]) => s[1] - (path.freezeSolidsFraction as number) }]),
    ];
    const sol = integrateAdaptive((_t, s) => dryingRates(path, zone, s).derivative, zone.startTime, y, zone.endTime, {
      rtol: path.rtol,
      atol,
      outputTimes: times,
      events,
      dense: true,
      keepSteps: false,
      maxSteps: 50_000,
    });
    if (sol.status !== 'completed') {
      throw new RangeError(`Drying path integration stopped in ${zone.name} at t = ${fmt(sol.tFinal)} s (${sol.status}); check the zone inputs`);
    }
    stats.accepted += sol.stats.accepted;
    stats.rejected += sol.stats.rejected;
    stats.evaluations += sol.stats.evaluations;
    if (frozenAt === null) {
      // Already frozen at the start of the path counts as frozen at t = 0.
      const gStart = events.map((e) => e.g(zone.startTime, y));
      const startIdx = gStart.findIndex((v) => v >= 0);
      if (startIdx >= 0) {
        frozenAt = zone.startTime;
        frozenBy = events[startIdx].name as 'viscosity' | 'solids';
      } else if (sol.events.length > 0) {
        frozenAt = sol.events[0].t;
        frozenBy = sol.events[0].name as 'viscosity' | 'solids';
      }
    }
    const points = sol.outputStates.map((state) => evaluateFilmPoint(path, zone, state, tables));
    runs.push({ zone, dense: sol.dense, times: sol.outputTimes, points });
    y = sol.yFinal;
  }

  // ── Series on the plotting grid ─────────────────────────────────────────
  const series: DryingSeries = {
    time: [],
    position: path.lineSpeed === null ? null : [],
    zoneIndex: [],
    thickness: [],
    solidsFraction: [],
    viscosity: [],
    filmTemperature: [],
    evaporationFlux: [],
    deltaT: [],
    deltaC: [],
    rayleigh: [],
    thermalMarangoni: [],
    solutalMarangoni: [],
    thermalBiot: [],
    massBiot: [],
    thermalMargin: [],
    solutalMargin: [],
    regime: [],
  };
  const positionAt = (t: number): number | null => (path.lineSpeed === null ? null : path.lineSpeed * t);
  for (const run of runs) {
    run.points.forEach((p, i) => {
      series.time.push(run.times[i]);
      series.position?.push(path.lineSpeed! * run.times[i]);
      series.zoneIndex.push(run.zone.index);
      series.thickness.push(p.thickness);
      series.solidsFraction.push(p.solidsFraction);
      series.viscosity.push(p.viscosity);
      series.filmTemperature.push(p.filmTemperature);
      series.evaporationFlux.push(p.evaporationFlux);
      series.deltaT.push(p.deltaT);
      series.deltaC.push(p.deltaC);
      series.rayleigh.push(p.rayleigh);
      series.thermalMarangoni.push(p.thermalMarangoni);
      series.solutalMarangoni.push(p.solutalMarangoni);
      series.thermalBiot.push(p.thermalBiot);
      series.massBiot.push(p.massBiot);
      series.thermalMargin.push(p.thermalMargin);
      series.solutalMargin.push(p.solutalMargin);
      series.regime.push(p.regime);
    });
  }

  // ── Events: zone entries, margin crossings, freezing ─────────────────────
  const events: DryingEvent[] = path.zones.map((z) => ({
    kind: 'zone-entry' as const,
    time: z.startTime,
    position: positionAt(z.startTime),
    zoneIndex: z.index,
    detail: `Enters ${z.name}: air ${fmt(z.airTemperature - 273.15)} °C, h ${fmt(z.heatTransferTop)} W/(m²·K), ${fmt(z.duration)} s`,
  }));
  for (const drive of ['solutal', 'thermal'] as const) {
    const marginOf = (p: FilmPoint): number => (drive === 'solutal' ? p.solutalMargin : p.thermalMargin);
    let previous: { run: ZoneRun; index: number } | null = null;
    for (const run of runs) {
      for (let i = 0; i < run.points.length; i++) {
        const now = marginOf(run.points[i]);
        const before = previous === null ? null : marginOf(previous.run.points[previous.index]);
        const fell = before === null ? now < 1 : before >= 1 && now < 1;
        const rose = before !== null && before < 1 && now >= 1;
        if (fell || rose) {
          let t = run.times[i];
          if (previous !== null && previous.run === run) t = refineCrossing(path, run, tables, drive, run.times[i - 1], run.times[i]);
          events.push({
            kind: fell ? 'cells-possible' : 'quiet-again',
            time: t,
            position: positionAt(t),
            zoneIndex: run.zone.index,
            drive,
            detail: fell
              ? `The ${drive} Onset margin falls below 1 in ${run.zone.name}: cells can start`
              : `The ${drive} Onset margin rises back above 1 in ${run.zone.name}`,
          });
        }
        previous = { run, index: i };
      }
    }
  }
  if (frozenAt !== null) {
    const zoneIndex = path.zones.find((z) => frozenAt! >= z.startTime && frozenAt! <= z.endTime)?.index ?? path.zones.length - 1;
    events.push({
      kind: 'film-frozen',
      time: frozenAt,
      position: positionAt(frozenAt),
      zoneIndex,
      detail:
        frozenBy === 'viscosity'
          ? `Film viscosity reaches ${fmt(path.freezeViscosity)} Pa·s: flow, and any cells, freeze`
          : `Solids reach ${fmt(path.freezeSolidsFraction ?? Number.NaN)} by volume: the film is packed and freezes`,
    });
  }
  events.sort((a, b) => a.time - b.time || (a.kind === 'zone-entry' ? -1 : b.kind === 'zone-entry' ? 1 : 0));

  // ── Onset, growth and verdict ───────────────────────────────────────────
  const firstCells = events.find((e) => e.kind === 'cells-possible') ?? null;
  const minThermalMargin = Math.min(...series.thermalMargin);
  const minSolutalMargin = Math.min(...series.solutalMargin);
  const limit = frozenAt ?? path.totalTime;
  // Growth (N_grow, e-folds while unstable) and decay after the last return to quiet (N_decay),
  // both by the trapezoid rule on the grid, up to the freeze (or the oven exit).
  let growthExponent = 0;
  let decayExponent = 0;
  let growthTime: number | null = null;
  let smallest = Number.POSITIVE_INFINITY;
  let unstableAtLimit = false;
  for (const run of runs) {
    for (let i = 0; i < run.points.length; i++) {
      const p = run.points[i];
      const m = Math.min(p.thermalMargin, p.solutalMargin);
      if (run.times[i] <= limit) unstableAtLimit = m < 1;
      if (m < 1 && m < smallest) {
        smallest = m;
        growthTime = 1 / p.growthRate;
      }
      if (i === 0) continue;
      const t0 = run.times[i - 1];
      const t1 = Math.min(run.times[i], limit);
      if (t1 <= t0) continue;
      const r0 = run.points[i - 1].growthRate;
      const r1 = p.growthRate;
      const mean = 0.5 * (r0 + r1);
      if (mean > 0) {
        growthExponent += mean * (t1 - t0);
        decayExponent = 0;
      } else if (growthExponent > 0) {
        decayExponent += -mean * (t1 - t0);
      }
    }
  }
  let verdict: DryingVerdict;
  if (firstCells === null) verdict = 'quiet';
  else if (growthExponent < PATTERN_E_FOLDS || decayExponent >= DECAYED_E_FOLDS) verdict = 'cells-die-out';
  else if (unstableAtLimit || decayExponent < PATTERN_E_FOLDS) verdict = 'pattern-expected';
  else verdict = 'pattern-possible';
  const where = (t: number): string =>
    path.lineSpeed === null ? `t = ${fmt(t)} s` : `t = ${fmt(t)} s (${fmt(path.lineSpeed * t)} m into the oven)`;
  const freezeText = frozenAt === null ? 'the film does not freeze inside the oven' : `the film freezes at ${where(frozenAt)}`;
  let verdictText: string;
  if (verdict === 'quiet') {
    verdictText = `Quiet: both Onset margins stay at or above 1 along the whole Drying path (smallest solutal ${fmt(minSolutalMargin)}, thermal ${fmt(minThermalMargin)}); no cells are expected.`;
  } else {
    const start = `Cells can start at ${where(firstCells!.time)}, driven by the ${firstCells!.drive} margin (smallest solutal ${fmt(minSolutalMargin)}, thermal ${fmt(minThermalMargin)}); growth time ≈ ${fmt(growthTime ?? Number.NaN)} s at the smallest margin, and ${freezeText}.`;
    const grew = `They grow by ${fmt(growthExponent)} e-folds`;
    if (verdict === 'cells-die-out') {
      verdictText =
        growthExponent < PATTERN_E_FOLDS
          ? `${start} They grow by only ${fmt(growthExponent)} e-folds before that, so no pattern is expected in the dry film.`
          : `${start} ${grew}, then the margin recovers and they decay by ${fmt(decayExponent)} e-folds before flow stops, so no pattern is expected in the dry film.`;
    } else if (verdict === 'pattern-expected') {
      verdictText = unstableAtLimit
        ? `${start} ${grew} and are still active when flow stops, so a cell pattern (Bénard cells or floating; silking on a moving web; haze if the cells are small) is expected in the dry film.`
        : `${start} ${grew}; the margin recovers, but they decay by only ${fmt(decayExponent)} e-folds before flow stops, so a cell pattern (Bénard cells or floating; silking on a moving web; haze if small) is expected in the dry film.`;
    } else {
      verdictText = `${start} ${grew}; the margin recovers and they decay by ${fmt(decayExponent)} e-folds before flow stops, so the cells partly level out: a faint pattern is possible.`;
    }
  }

  // ── Zone summaries and ventilation cautions ─────────────────────────────
  const { solvent } = input;
  const zones: DryingZoneSummary[] = runs.map((run) => {
    const first = run.points[0];
    const last = run.points[run.points.length - 1];
    const solventThickness = (p: FilmPoint): number => p.thickness * (1 - p.solidsFraction);
    const perArea = solvent.density * Math.max(0, solventThickness(first) - solventThickness(last));
    const areaRate = path.lineSpeed !== null && path.webWidth !== null ? path.lineSpeed * path.webWidth : null;
    const massRate = areaRate === null ? null : perArea * areaRate;
    return {
      index: run.zone.index,
      name: run.zone.name,
      startTime: run.zone.startTime,
      endTime: run.zone.endTime,
      residenceTime: run.zone.duration,
      startPosition: positionAt(run.zone.startTime),
      endPosition: positionAt(run.zone.endTime),
      thicknessIn: first.thickness,
      thicknessOut: last.thickness,
      solidsIn: first.solidsFraction,
      solidsOut: last.solidsFraction,
      filmTemperatureOut: last.filmTemperature,
      maxFilmTemperature: Math.max(...run.points.map((p) => p.filmTemperature)),
      massTransferCoefficient: run.zone.massTransferCoefficient,
      solventEvaporatedPerArea: perArea,
      solventMassRate: massRate,
      solventLitresPerMinute: massRate === null ? null : (massRate / solvent.density) * 60_000,
      minThermalMargin: Math.min(...run.points.map((p) => p.thermalMargin)),
      minSolutalMargin: Math.min(...run.points.map((p) => p.solutalMargin)),
      ventilation:
        massRate === null
          ? null
          : solventVentilationCaution({
              solventMassRate: massRate,
              molarMass: solvent.molarMass,
              lowerFlammableLimit: solvent.lowerFlammableLimit,
              exhaustTemperature: run.zone.airTemperature,
              continuousMonitoring: input.continuousSolventMonitoring ?? false,
            }),
    };
  });

  // ── Mass balance and warnings ───────────────────────────────────────────
  const exitThickness = y[0];
  const exitSolids = y[1];
  const modelledDryThickness = exitThickness * exitSolids;
  const massBalance = {
    expectedDryThickness: path.solidsThickness,
    modelledDryThickness,
    relativeError: Math.abs(modelledDryThickness - path.solidsThickness) / path.solidsThickness,
    exitThickness,
    exitSolventFraction: 1 - exitSolids,
  };
  const warnings: string[] = [];
  const vol = solvent.volatility;
  if (vol.kind === 'antoine') {
    const temps = series.filmTemperature;
    const lo = Math.min(...temps);
    const hi = Math.max(...temps);
    if ((vol.validFrom !== undefined && lo < vol.validFrom) || (vol.validTo !== undefined && hi > vol.validTo)) {
      warnings.push(
        `Film temperature ${fmt(lo - 273.15)}–${fmt(hi - 273.15)} °C leaves the Antoine constants' fitted range (${fmt((vol.validFrom ?? Number.NaN) - 273.15)}–${fmt((vol.validTo ?? Number.NaN) - 273.15)} °C): vapour pressure is extrapolated.`,
      );
    }
    const psatMax = Math.max(...runs.flatMap((r) => r.points.map((p) => p.vapourPressure)));
    if (psatMax > 50_000) {
      warnings.push(
        `Solvent vapour pressure reaches ${fmt(psatMax / 1000)} kPa: the low-rate mass-transfer model (no Stefan-flow correction) understates evaporation near boiling.`,
      );
    }
  }
  if (frozenAt === null) warnings.push('The film is still liquid at the oven exit (viscosity below the freeze threshold): drying and any cell growth continue downstream.');
  if (massBalance.exitSolventFraction > 0.05) {
    warnings.push(`${fmt(massBalance.exitSolventFraction * 100)} % solvent by volume is left in the film at the oven exit (retained solvent).`);
  }
  const maxThermalBiot = Math.max(...series.thermalBiot);
  if (maxThermalBiot > 0.1) {
    warnings.push(`Film Biot number reaches ${fmt(maxThermalBiot)}: the single film temperature (lumped, Bi ≪ 1) is only approximate.`);
  }

  return {
    series,
    events,
    zones,
    onset: {
      cellsPossibleAt: firstCells?.time ?? null,
      drive: firstCells?.drive ?? null,
      frozenAt,
      frozenBy,
      minThermalMargin,
      minSolutalMargin,
      growthTime,
      growthExponent,
      decayExponent,
      verdict,
      verdictText,
    },
    massBalance,
    warnings,
    stats,
  };
}
