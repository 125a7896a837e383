/**
 * Stability solver benchmark (standalone; run by `npm run bench` or `npm run bench -- solver`).
 * Prints the median time of one critical solve (λ minimised over the wavenumber) for several
 * boundary sets, and of a 200-depth Quiet-window sweep of onsetMargin, against the targets in
 * the design notes: ≤ 1 ms per solve, ≤ 100 ms per 200-depth window, judged on wall time. CPU time
 * of this process is printed beside it because a shared machine under load inflates wall time.
 * Exits 0 either way: the numbers are for people to read; a miss is printed as MISSED with the factor.
 */
import { cpus, loadavg } from 'node:os';
import { criticalMarangoni, criticalRayleigh, onsetMargin, onsetMarginSweep, type LayerBoundaries, type StabilityProblem } from '../shared/physics/stability';

const SOLVE_TARGET_MS = 1;
const WINDOW_TARGET_MS = 100;

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Median wall time and median CPU time (user + system of this process) per run [ms]. */
function time(run: () => unknown, repeats: number, warmup: number): { wall: number; cpu: number } {
  for (let i = 0; i < warmup; i++) run();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    run();
    wall.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

function report(label: string, measured: { wall: number; cpu: number }, target: number): boolean {
  const ok = measured.wall <= target;
  const verdict = ok ? 'ok' : `MISSED by ×${(measured.wall / target).toFixed(2)}`;
  console.log(
    `${label.padEnd(58)} median ${measured.wall.toFixed(3).padStart(9)} ms wall, ${measured.cpu.toFixed(3).padStart(9)} ms CPU   target ≤ ${target} ms   ${verdict}`,
  );
  return ok;
}

const conductingRigid: LayerBoundaries = { bottom: 'rigid', bottomThermal: 'conducting', top: 'rigid', biot: Infinity };
const rigidFree: LayerBoundaries = { bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: Infinity };
const nield: LayerBoundaries = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0 };
const coating: LayerBoundaries = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0.05 };

console.log(`node ${process.version}, ${cpus().length} CPU(s), load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}`);
let allOk = true;
allOk = report('criticalRayleigh rigid/rigid conducting', time(() => criticalRayleigh(conductingRigid), 200, 50), SOLVE_TARGET_MS) && allOk;
allOk = report('criticalRayleigh rigid/free conducting', time(() => criticalRayleigh(rigidFree), 200, 50), SOLVE_TARGET_MS) && allOk;
allOk = report('criticalRayleigh Nield (insulating free top)', time(() => criticalRayleigh(nield), 200, 50), SOLVE_TARGET_MS) && allOk;
allOk = report('criticalMarangoni Pearson Bi = 0', time(() => criticalMarangoni(nield), 200, 50), SOLVE_TARGET_MS) && allOk;
allOk =
  report('onsetMargin coupled Ra + Ma, flat, Bi = 0.1', time(() => onsetMargin({ ...coating, biot: 0.1, rayleigh: 300, marangoni: 40 }), 200, 50), SOLVE_TARGET_MS) &&
  allOk;
allOk =
  report(
    'onsetMargin coupled, deformable surface (Cr 1e-3, Bo 0.1)',
    time(() => onsetMargin({ ...coating, rayleigh: 300, marangoni: 40, crispation: 1e-3, bond: 0.1 }), 200, 50),
    SOLVE_TARGET_MS,
  ) && allOk;

// Quiet window: 200 depths from 20 µm to 5 mm for a solvent-borne coat on a steel plate, ΔT fixed.
// Ra ∝ d³, Ma ∝ d, Bi ∝ d, Cr ∝ 1/d, Bo ∝ d² (dimensionless groups at the 1 mm reference depth below are
// illustrative round numbers for a low-viscosity solvent, not measured properties).
const reference = { depth: 1e-3, rayleigh: 120, marangoni: 60, biot: 0.01, crispation: 2e-6, bond: 0.3 };
function windowProblems(deformable: boolean): StabilityProblem[] {
  return Array.from({ length: 200 }, (_, i) => {
    const depth = 20e-6 * Math.pow(5e-3 / 20e-6, i / 199);
    const s = depth / reference.depth;
    return {
      ...coating,
      biot: reference.biot * s,
      rayleigh: reference.rayleigh * s ** 3,
      marangoni: reference.marangoni * s,
      ...(deformable ? { crispation: reference.crispation / s, bond: reference.bond * s * s } : {}),
    };
  });
}
const flatWindow = windowProblems(false);
const deformableWindow = windowProblems(true);
/** One onsetMargin per depth, each a cold search (as a caller that does not pass hints). */
function window(problems: StabilityProblem[]): number {
  let quiet = 0;
  for (const problem of problems) if (onsetMargin(problem).margin >= 1) quiet += 1;
  return quiet;
}
/** The same depths through onsetMarginSweep (each search starts at the previous k_c). */
function windowSweep(problems: StabilityProblem[]): number {
  return onsetMarginSweep(problems).filter((r) => r.margin >= 1).length;
}
allOk = report('Quiet window: 200 depths, flat surface (cold)', time(() => window(flatWindow), 15, 3), WINDOW_TARGET_MS) && allOk;
allOk = report('Quiet window: 200 depths, deformable surface (cold)', time(() => window(deformableWindow), 15, 3), WINDOW_TARGET_MS) && allOk;
allOk = report('Quiet window: 200 depths, flat, onsetMarginSweep', time(() => windowSweep(flatWindow), 15, 3), WINDOW_TARGET_MS) && allOk;
allOk = report('Quiet window: 200 depths, deformable, onsetMarginSweep', time(() => windowSweep(deformableWindow), 15, 3), WINDOW_TARGET_MS) && allOk;
console.log(allOk ? 'solver benchmark: all targets met' : 'solver benchmark: some targets missed (see MISSED lines)');
