/**
 * Process sheet PDF benchmark (standalone; run by `npm run bench` or `npm run bench -- sheet-pdf`).
 * Prints the median time to render one signed Process sheet PDF (A4, embedded Noto Sans subsets,
 * property table, dimensionless groups, vector quiet window, cautions, signature block, footers)
 * from a frozen snapshot, against the design target ≤ 500 ms. The snapshot (evaluation and quiet
 * window) is built once beforehand, as the server does when the sheet is issued. Exits 0 either way;
 * a miss is printed as MISSED with the factor.
 */
import { cpus, loadavg } from 'node:os';
import { readFluidInput } from '../shared/fluids/read-fluid-input';
import { fluidInputSchema } from '../shared/schemas/fluids';
import { demoFluidInputs } from '../scripts/lib/seed/demo-fluids';
import { buildSheetSnapshot } from '../server/features/sheets/build-sheet-snapshot';
import { renderSheetPdf, type SheetPdfInput } from '../server/features/sheets/pdf/render-sheet-pdf';

const TARGET_MS = 500;
const WARMUP = 3;
const REPEATS = 15;

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

const primer = demoFluidInputs().find((f) => f.name.startsWith('Primer solvent blend'));
if (!primer) throw new Error('demo primer fluid not found');
const read = readFluidInput(fluidInputSchema.parse(primer));
if (!read.ok) throw new Error(`demo primer fluid does not read: ${JSON.stringify(read.fields)}`);
const { name, kind, notes: _notes, laws, ...definition } = read.fluid;
const check = {
  title: 'Line 2 primer, oven zone 1',
  fluidId: '00000000-0000-4000-8000-000000000001',
  notes: 'Invented Larkspur Coatings demo check.',
  processKind: 'drying-coat',
  temperature: '35 °C',
  depth: '60 µm',
  bottom: { mechanics: 'rigid', thermal: 'conducting' },
  top: 'surface',
  deformableSurface: true,
  heating: { mode: 'substrate-air', substrateTemperature: '45 °C', airTemperature: '30 °C', heatTransferCoefficient: '25 W/(m²·K)' },
  alertThreshold: 1.25,
};
const snapshot = buildSheetSnapshot({
  check: { id: '00000000-0000-4000-8000-000000000002', title: check.title, processKind: 'drying-coat' },
  revision: { revision: 2, input: check, savedAt: new Date('2026-11-30T10:00:00Z'), savedByName: 'Mira Łęcka' },
  fluid: { id: check.fluidId, name, kind, archived: false, definition, laws },
});
const input: SheetPdfInput = {
  number: 'LC-PS-0001',
  revision: 2,
  state: 'signed',
  title: check.title,
  line: 'Line 2',
  purpose: 'Release the primer at 60 µm wet through oven zone 1.',
  authorName: 'Mira Łęcka',
  createdAt: '2026-12-01T09:00:00Z',
  snapshot,
  signature: { printedName: 'Dörte Quinn', roleLabel: 'QA reviewer', signedAt: '2026-12-02T03:45:12Z', meaningText: 'Approved for production' },
  returns: [{ revision: 1, reviewerName: 'Dörte Quinn', comments: 'State the source of dσ/dT.', returnedAt: '2026-12-01T12:00:00Z' }],
  publicUrl: 'http://127.0.0.1:3000',
};

for (let i = 0; i < WARMUP; i++) await renderSheetPdf(input);
const samples: number[] = [];
let bytes = 0;
for (let i = 0; i < REPEATS; i++) {
  const start = performance.now();
  const pdf = await renderSheetPdf(input);
  samples.push(performance.now() - start);
  bytes = pdf.length;
}
const ms = median(samples);
const verdict = ms <= TARGET_MS ? 'ok' : `MISSED by ×${(ms / TARGET_MS).toFixed(2)}`;
console.log(`machine: ${cpus().length} cores, load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}`);
console.log(`${'Process sheet PDF, signed, from snapshot'.padEnd(58)} median ${ms.toFixed(1).padStart(8)} ms   target ≤ ${TARGET_MS} ms   ${verdict}`);
console.log(`  min ${Math.min(...samples).toFixed(1)} ms, max ${Math.max(...samples).toFixed(1)} ms over ${REPEATS} runs; ${(bytes / 1024).toFixed(1)} kB per PDF`);
