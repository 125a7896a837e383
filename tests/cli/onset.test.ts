import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import refs from '../fixtures/onset-references.json';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const fixtures = join(root, 'tests', 'fixtures', 'onset');
const G = 9.80665; // standard gravity (CGPM 1901)
const rel = (a: number, b: number) => Math.abs(a / b - 1);

const outputFields = [
  'id', 'rayleigh', 'marangoni', 'biot', 'prandtl', 'bond', 'crispation', 'galileo', 'criticalRayleigh',
  'criticalMarangoni', 'cellMargin', 'criticalWavenumber', 'wavelength', 'margin', 'regime', 'longWave',
  'maxStableDepth', 'minStableDepth', 'maxDeltaT', 'error',
];

function runOnset(file: string) {
  const run = spawnSync(process.execPath, ['--import', 'tsx', join(root, 'scripts', 'onset.ts'), file], { cwd: root, encoding: 'utf8' });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

describe('npm run onset -- FILE.csv', () => {
  const run = runOnset(join(fixtures, 'cases.csv'));
  const parsed = Papa.parse<Record<string, string>>(run.stdout.trim(), { header: true });
  const rows = parsed.data;
  const byId = Object.fromEntries(rows.map((r) => [r.id, r]));

  it('writes a CSV header with exactly the documented fields, then one row per case in order', () => {
    expect(parsed.meta.fields).toEqual(outputFields);
    expect(rows.map((r) => r.id)).toEqual(['pearson-half', 'rigid-rigid', 'free-free', 'thin-oil', 'bad-depth']);
  });
  it('exits 1 because one row failed, and names the bad field in that row only', () => {
    expect(run.status).toBe(1);
    expect(byId['bad-depth'].error).toMatch(/^depth: must be > 0/);
    expect(byId['bad-depth'].margin).toBe('');
    expect(rows.filter((r) => r.error !== '').length).toBe(1);
  });
  it(`Pearson (1958): Ma = half of ${refs.pearson.criticalMarangoni} gives margin 2 and Ma_c, k_c as published`, () => {
    const r = byId['pearson-half'];
    expect(rel(Number(r.margin), 2)).toBeLessThan(2e-5);
    expect(rel(Number(r.criticalMarangoni), refs.pearson.criticalMarangoni)).toBeLessThan(2e-5);
    expect(rel(Number(r.criticalWavenumber), refs.pearson.wavenumber)).toBeLessThan(5e-4);
    expect(rel(Number(r.criticalRayleigh), refs.nield.criticalRayleigh)).toBeLessThan(2e-5); // Nield (1964), same boundaries
    expect(r.regime).toBe('Quiet');
    expect(r.prandtl).toBe('');
    expect(r.wavelength).toBe('');
  });
  it('Chandrasekhar (1961): rigid–rigid Ra_c = 1707.762 at k_c = 3.117; omitted biot means a conducting top', () => {
    const r = byId['rigid-rigid'];
    expect(rel(Number(r.criticalRayleigh), 1707.762)).toBeLessThan(1e-6);
    expect(rel(Number(r.cellMargin), 1.707762)).toBeLessThan(1e-6);
    expect(Math.abs(Number(r.criticalWavenumber) - 3.117)).toBeLessThan(1e-3);
    expect(r.biot).toBe('Infinity');
    expect(r.criticalMarangoni).toBe('');
    expect(r.margin).toBe(r.cellMargin);
  });
  it('Chandrasekhar (1961): free–free Ra_c = 27π⁴/4 at k_c = π/√2', () => {
    const r = byId['free-free'];
    expect(rel(Number(r.criticalRayleigh), (27 * Math.PI ** 4) / 4)).toBeLessThan(1e-6);
    expect(rel(Number(r.criticalWavenumber), Math.PI / Math.SQRT2)).toBeLessThan(1e-4);
  });
  it('physical row: groups by hand, cells per Pearson, long-wave thinning first per VanHook et al. (1997)', () => {
    const r = byId['thin-oil'];
    expect(rel(Number(r.marangoni), 100)).toBeLessThan(1e-12); // 1e-4 × 10 × 1e-4 / (0.01 × 1e-7)
    expect(rel(Number(r.galileo), G)).toBeLessThan(1e-12); // 9.80665 × 1e-12 / (1e-5 × 1e-7)
    expect(rel(Number(r.crispation), 1 / 3000)).toBeLessThan(1e-12); // 0.01 × 1e-7 / (0.03 × 1e-4)
    expect(rel(Number(r.bond), (1000 * G * 1e-8) / 0.03)).toBeLessThan(1e-12);
    expect(rel(Number(r.cellMargin), refs.pearson.criticalMarangoni / 100)).toBeLessThan(2e-5);
    expect(rel(Number(r.wavelength), (2 * Math.PI * 1e-4) / refs.pearson.wavenumber)).toBeLessThan(5e-4);
    expect(rel(Number(r.maxDeltaT), ((2 / 3) * 1000 * G * 1e-8) / 1e-4)).toBeLessThan(1e-4);
    expect(Number(r.margin)).toBeLessThanOrEqual(Number(r.cellMargin));
    expect(r.longWave).toBe('true');
    expect(r.regime).toBe('Long-wave thinning');
    expect(rel(Number(r.maxStableDepth), (refs.pearson.criticalMarangoni * 0.01 * 1e-7) / (1e-4 * 10))).toBeLessThan(2e-5);
    expect(rel(Number(r.minStableDepth), Math.sqrt((3 * 1e-4 * 10) / (2 * 1000 * G)))).toBeLessThan(1e-4);
  });
}, 60_000);

describe('npm run onset -- FILE.json', () => {
  it('writes a JSON array in input order with the documented keys and exits 0 when all cases compute', () => {
    const run = runOnset(join(fixtures, 'cases.json'));
    expect(run.status).toBe(0);
    const results = JSON.parse(run.stdout) as Record<string, unknown>[];
    expect(results.map((r) => r.id)).toEqual(['nield', 'rigid-free', '7']);
    expect(Object.keys(results[0])).toEqual(outputFields);
    expect(rel(results[0].margin as number, 2)).toBeLessThan(2e-5); // Nield (1964): 334.5 = 669.00 / 2
    expect(rel(results[1].margin as number, 1)).toBeLessThan(1e-5); // Chandrasekhar (1961): 1100.65
    expect(results[2].error).toBeNull();
    expect(results[2].regime).toBe('Long-wave thinning');
  });
}, 60_000);

describe('npm run onset: files that cannot be read exit 2', () => {
  it('a missing file', () => {
    const run = runOnset(join(fixtures, 'no-such-file.csv'));
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/cannot read the file \(ENOENT\)/);
  });
  it('malformed JSON', () => {
    const run = runOnset(join(fixtures, 'broken.json'));
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/not valid JSON/);
  });
  it('a file that is neither CSV nor JSON', () => {
    const run = runOnset(join(fixtures, 'README.md'));
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/expected a \.csv or \.json file/);
  });
}, 60_000);
